  local columns = {}
  if #grid == 0 then
    return columns
  end
  for i = 1, #grid[1] do
    local column = {}
    for _, row in ipairs(grid) do
      column[#column + 1] = row[i]
    end
    columns[i] = column
  end
  return columns
end
