  local averages = {}
  for i = window, #values do
    local sum = 0.0
    for j = i - window + 1, i do
      sum = sum + values[j]
    end
    averages[#averages + 1] = sum / window
  end
  return averages
end
