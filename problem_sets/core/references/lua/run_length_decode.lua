  local parts = {}
  for count, ch in code:gmatch("(%d+)(" .. utf8.charpattern .. ")") do
    parts[#parts + 1] = ch:rep(tonumber(count))
  end
  return table.concat(parts)
end
