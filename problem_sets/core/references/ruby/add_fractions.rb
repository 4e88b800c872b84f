# Rational keeps lowest terms with a positive denominator, and zero as 0/1.
total = fracs.sum(Rational(0)) { |numerator, denominator| Rational(numerator, denominator) }
[total.numerator, total.denominator]
end
