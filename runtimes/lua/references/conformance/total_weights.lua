  local total = 0.0
  for _, items in pairs(crates) do
    for _, weight in pairs(items) do
      total = total + weight
    end
  end
  return total
end
