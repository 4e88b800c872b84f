  local total, total_weight = 0.0, 0.0
  for i, value in ipairs(values) do
    total = total + value * weights[i]
    total_weight = total_weight + weights[i]
  end
  if total_weight == 0 then
    return nil
  end
  return total / total_weight
end
