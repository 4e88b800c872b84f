  local totals = {}
  for _, row in ipairs(grid) do
    for j, value in ipairs(row) do
      totals[j] = (totals[j] or 0) + value
    end
  end
  return totals
end
