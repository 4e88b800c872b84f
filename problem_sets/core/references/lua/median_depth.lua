  if #depths == 0 then
    return nil
  end
  local ordered = table.move(depths, 1, #depths, 1, {})
  table.sort(ordered)
  local mid = #ordered // 2
  if #ordered % 2 == 1 then
    return ordered[mid + 1]
  end
  return (ordered[mid] + ordered[mid + 1]) / 2
end
