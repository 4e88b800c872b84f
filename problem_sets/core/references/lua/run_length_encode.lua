  local parts = {}
  local current, length = nil, 0
  for ch in text:gmatch(utf8.charpattern) do
    if ch == current then
      length = length + 1
    else
      if current ~= nil then
        parts[#parts + 1] = length .. current
      end
      current, length = ch, 1
    end
  end
  if current ~= nil then
    parts[#parts + 1] = length .. current
  end
  return table.concat(parts)
end
