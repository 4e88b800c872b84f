text.each_char.tally
end
