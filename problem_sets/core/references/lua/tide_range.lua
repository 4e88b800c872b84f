  if #readings == 0 then
    return 0
  end
  local low, high = readings[1], readings[1]
  for _, reading in ipairs(readings) do
    low = math.min(low, reading)
    high = math.max(high, reading)
  end
  return high - low
end
