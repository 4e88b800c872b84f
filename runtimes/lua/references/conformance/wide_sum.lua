  local total = 0
  for _, value in ipairs(values) do
    total = total + value
  end
  return total
end
