  local counts = {}
  for _, name in ipairs(species) do
    counts[name] = (counts[name] or 0) + 1
  end
  -- The standalone interpreter runs in the C locale, where < compares strings byte by byte:
  -- code point order for UTF-8.
  local best
  for name, count in pairs(counts) do
    if best == nil or count > counts[best] or (count == counts[best] and name < best) then
      best = name
    end
  end
  return best
end
