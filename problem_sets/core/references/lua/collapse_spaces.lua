  local words = {}
  for word in text:gmatch("[^ \t\n]+") do
    words[#words + 1] = word
  end
  return table.concat(words, " ")
end
