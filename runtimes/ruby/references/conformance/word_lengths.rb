words.to_h { |word| [word, word.length] }
end
