# String#[0] is the first code point of a UTF-8 string.
words.reject(&:empty?).group_by { |word| word[0] }
end
