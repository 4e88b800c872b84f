# Recursive descent over the tokens: numbers and single-character operators, spaces dropped.
# A division by zero is noted and the rest of the expression still evaluated.
tokens = expr.scan(/[0-9]+|[^ ]/)
pos = 0
divided_by_zero = false
sum = product = unary = atom = nil
sum = lambda do
  value = product.call
  while %w[+ -].include?(tokens[pos])
    op = tokens[pos]
    pos += 1
    right = product.call
    value = op == "+" ? value + right : value - right
  end
  value
end
product = lambda do
  value = unary.call
  while %w[* /].include?(tokens[pos])
    op = tokens[pos]
    pos += 1
    right = unary.call
    if op == "*"
      value *= right
    elsif right.zero?
      divided_by_zero = true
      value = 0
    else
      # Integer#/ rounds toward negative infinity; the exact quotient truncated rounds toward zero.
      value = value.quo(right).truncate
    end
  end
  value
end
unary = lambda do
  return atom.call unless tokens[pos] == "-"

  pos += 1
  -unary.call
end
atom = lambda do
  token = tokens[pos]
  pos += 1
  return token.to_i unless token == "("

  value = sum.call
  pos += 1 # the closing parenthesis
  value
end
value = sum.call
divided_by_zero ? nil : value
end
