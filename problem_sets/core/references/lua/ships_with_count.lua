  local names = {}
  for name, count in pairs(tally) do
    if count == target then
      names[#names + 1] = name
    end
  end
  -- The standalone interpreter runs in the C locale, where < compares strings byte by byte:
  -- code point order for UTF-8.
  table.sort(names)
  return names
end
