  local scaled = {}
  for i, offset in ipairs(offsets) do
    scaled[i] = offset * factor
  end
  return scaled
end
