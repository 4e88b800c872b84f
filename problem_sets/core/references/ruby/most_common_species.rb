# Highest count first, then the smallest name: String comparison is by UTF-8 bytes, which
# orders names by code point.
return nil if species.empty?

species.tally.min_by { |name, count| [-count, name] }.first
end
