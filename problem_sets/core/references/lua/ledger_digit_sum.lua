  -- The decimal text sidesteps the absolute value, which overflows for math.mininteger.
  local total = 0
  for digit in string.format("%d", n):gmatch("%d") do
    total = total + tonumber(digit)
  end
  return total
end
