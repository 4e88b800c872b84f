  local result = {}
  for i, row in ipairs(a) do
    result[i] = {}
    for j = 1, #b[1] do
      local total = 0
      for t, value in ipairs(row) do
        total = total + value * b[t][j]
      end
      result[i][j] = total
    end
  end
  return result
end
