  local patched = {}
  for i, reading in ipairs(readings) do
    if reading ~= reading then
      patched[i] = fill
    else
      patched[i] = reading
    end
  end
  return patched
end
