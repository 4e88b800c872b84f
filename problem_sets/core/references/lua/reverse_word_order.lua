  local words = {}
  for word in line:gmatch("[^ ]+") do
    table.insert(words, 1, word)
  end
  return table.concat(words, " ")
end
