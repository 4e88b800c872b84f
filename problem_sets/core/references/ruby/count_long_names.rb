# String#length counts code points in a UTF-8 string.
names.count { |name| name.length >= min_length }
end
