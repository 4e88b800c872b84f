  local lines = {}
  local current, length = nil, 0
  for _, word in ipairs(words) do
    local size = utf8.len(word)
    if current == nil then
      current, length = word, size
    elseif length + 1 + size <= width then
      current = current .. " " .. word
      length = length + 1 + size
    else
      lines[#lines + 1] = current
      current, length = word, size
    end
  end
  if current ~= nil then
    lines[#lines + 1] = current
  end
  return lines
end
