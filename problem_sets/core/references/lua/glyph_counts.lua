  local counts = {}
  for ch in text:gmatch(utf8.charpattern) do
    counts[ch] = (counts[ch] or 0) + 1
  end
  return counts
end
