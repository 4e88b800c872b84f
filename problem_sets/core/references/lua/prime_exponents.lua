  -- Trial division: n <= 10^12, so divisors stay below 10^6.
  local exponents = {}
  local d = 2
  while d * d <= n do
    while n % d == 0 do
      exponents[tostring(d)] = (exponents[tostring(d)] or 0) + 1
      n = n // d
    end
    d = d + 1
  end
  if n > 1 then
    exponents[tostring(n)] = (exponents[tostring(n)] or 0) + 1
  end
  return exponents
end
