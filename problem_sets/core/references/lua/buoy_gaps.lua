  local gaps = {}
  for i = 2, #positions do
    gaps[i - 1] = positions[i] - positions[i - 1]
  end
  return gaps
end
