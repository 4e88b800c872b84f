# String#length counts code points in a UTF-8 string.
words.each_with_object([]) do |word, lines|
  if lines.any? && lines.last.length + 1 + word.length <= width
    lines.last << " " << word
  else
    lines << word.dup
  end
end
end
