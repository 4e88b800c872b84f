  if n == 0 then
    return "0"
  end
  local symbols = "0123456789abcdefghijklmnopqrstuvwxyz"
  -- Work with the negative of the absolute value, which always fits (math.mininteger has no
  -- positive counterpart). math.fmod on integers truncates, so each remainder is in (-base, 0].
  local q = n < 0 and n or -n
  local digits = {}
  while q ~= 0 do
    local d = -math.fmod(q, base)
    digits[#digits + 1] = symbols:sub(d + 1, d + 1)
    q = (q + d) // base
  end
  return (n < 0 and "-" or "") .. table.concat(digits):reverse()
end
