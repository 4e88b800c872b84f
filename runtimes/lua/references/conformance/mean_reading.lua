  if #readings == 0 then
    return 0.0
  end
  local total = 0.0
  for _, reading in ipairs(readings) do
    total = total + reading
  end
  return total / #readings
end
