chars = text.chars
# matches[j]: the pattern read so far matches the first j characters of the text.
matches = [true] + [false] * chars.size
pattern.each_char do |p|
  matches =
    if p == "*"
      seen = false
      matches.map { |matched| seen ||= matched }
    else
      [false] + chars.each_index.map { |j| matches[j] && (p == "?" || p == chars[j]) }
    end
end
matches[chars.size]
end
