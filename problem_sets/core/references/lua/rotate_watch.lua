  local n = #crew
  if n == 0 then
    return {}
  end
  local r = k % n
  local rotated = table.move(crew, r + 1, n, 1, {})
  return table.move(crew, 1, r, n - r + 1, rotated)
end
