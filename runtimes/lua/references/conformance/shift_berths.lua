  local shifted = {}
  for berth, vessel in pairs(owners) do
    shifted[berth + offset] = vessel
  end
  return shifted
end
