  local total = 0
  for _, mark in ipairs(marks) do
    total = total + mark
  end
  return {utf8.len(entries), total}
end
