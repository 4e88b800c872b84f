  local lengths = {}
  for _, word in ipairs(words) do
    lengths[word] = utf8.len(word)
  end
  return lengths
end
