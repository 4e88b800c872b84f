  local function gcd(x, y)
    while y ~= 0 do
      x, y = y, x % y
    end
    return math.abs(x)
  end
  local num, den = 0, 1
  for _, frac in ipairs(fracs) do
    local p, q = frac[1], frac[2]
    if q < 0 then
      p, q = -p, -q
    end
    -- Add over the least common denominator so the numbers stay small.
    local g = gcd(den, q)
    num = num * (q // g) + p * (den // g)
    den = den // g * q
    g = gcd(num, den)
    num, den = num // g, den // g
  end
  return {num, den}
end
