# Integers are unbounded, so the most negative 64-bit value has an absolute value too.
n.abs.digits.sum
end
