  local groups = {}
  for _, word in ipairs(words) do
    if word ~= "" then
      local initial = word:match("^" .. utf8.charpattern)
      groups[initial] = groups[initial] or {}
      table.insert(groups[initial], word)
    end
  end
  return groups
end
