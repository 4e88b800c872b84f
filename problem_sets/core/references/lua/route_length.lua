  local total = 0.0
  for i = 2, #points do
    local dx = points[i][1] - points[i - 1][1]
    local dy = points[i][2] - points[i - 1][2]
    total = total + math.sqrt(dx * dx + dy * dy)
  end
  return total
end
