# Integer#gcd is never negative, and gcd(0, x) is |x|.
counts.reduce(0) { |divisor, count| divisor.gcd(count) }
end
