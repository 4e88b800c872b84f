  local flipped = {}
  for i, flag in ipairs(flags) do
    flipped[i] = not flag
  end
  return flipped
end
