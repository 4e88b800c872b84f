# String comparison is by UTF-8 bytes, which orders names by code point.
tally.select { |_ship, count| count == target }.keys.sort
end
