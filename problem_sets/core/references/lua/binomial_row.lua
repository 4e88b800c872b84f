  local row = {1}
  for _ = 1, n do
    local next_row = {1}
    for k = 2, #row do
      next_row[k] = row[k - 1] + row[k]
    end
    next_row[#row + 1] = 1
    row = next_row
  end
  return row
end
