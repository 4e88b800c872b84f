  if #values == 0 then
    return nil
  end
  local low, high = values[1], values[1]
  for _, value in ipairs(values) do
    low = math.min(low, value)
    high = math.max(high, value)
  end
  return {low, high}
end
