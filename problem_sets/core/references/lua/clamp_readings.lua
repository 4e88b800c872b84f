  local limited = {}
  for i, value in ipairs(values) do
    if low ~= nil and value < low then
      value = low
    end
    if high ~= nil and value > high then
      value = high
    end
    limited[i] = value
  end
  return limited
end
