  local sum, missing = 0, 0
  for _, reading in ipairs(readings) do
    if reading == null then
      missing = missing + 1
    else
      sum = sum + reading
    end
  end
  return {sum, missing}
end
