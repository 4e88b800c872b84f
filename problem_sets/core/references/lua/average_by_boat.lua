  local sums, counts = {}, {}
  for _, catch in ipairs(catches) do
    local boat, weight = catch[1], catch[2]
    sums[boat] = (sums[boat] or 0.0) + weight
    counts[boat] = (counts[boat] or 0) + 1
  end
  local means = {}
  for boat, sum in pairs(sums) do
    means[boat] = sum / counts[boat]
  end
  return means
end
