  local merged = {}
  for ship, count in pairs(a) do
    merged[ship] = count
  end
  for ship, count in pairs(b) do
    merged[ship] = (merged[ship] or 0) + count
  end
  return merged
end
