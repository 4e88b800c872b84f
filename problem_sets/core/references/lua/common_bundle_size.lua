  local g = 0
  for _, count in ipairs(counts) do
    local a, b = g, math.abs(count)
    while b ~= 0 do
      a, b = b, a % b
    end
    g = a
  end
  return g
end
