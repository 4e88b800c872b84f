  if #weights == 0 then
    return nil
  end
  local sum = 0.0
  for _, weight in ipairs(weights) do
    sum = sum + weight
  end
  return sum / #weights
end
