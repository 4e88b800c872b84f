# Trial division; n <= 10^12, so divisors stay below 10^6.
exponents = Hash.new(0)
rest = n
divisor = 2
while divisor * divisor <= rest
  while (rest % divisor).zero?
    exponents[divisor.to_s] += 1
    rest /= divisor
  end
  divisor += divisor == 2 ? 1 : 2
end
exponents[rest.to_s] += 1 if rest > 1
exponents
end
