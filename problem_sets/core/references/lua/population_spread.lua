  if #values == 0 then
    return 0.0
  end
  local sum = 0.0
  for _, value in ipairs(values) do
    sum = sum + value
  end
  local mean = sum / #values
  local squares = 0.0
  for _, value in ipairs(values) do
    squares = squares + (value - mean) ^ 2
  end
  return math.sqrt(squares / #values)
end
