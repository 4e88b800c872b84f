# String#length and #chars work in code points for UTF-8 strings.
return nil unless a.length == b.length

a.chars.zip(b.chars).count { |x, y| x != y }
end
