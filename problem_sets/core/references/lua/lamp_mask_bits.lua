  -- Lua integers are 64-bit two's complement; each step clears the lowest set bit.
  local count = 0
  while mask ~= 0 do
    mask = mask & (mask - 1)
    count = count + 1
  end
  return count
end
