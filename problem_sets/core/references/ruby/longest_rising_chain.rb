# Patience sorting: tails[k] is the smallest last value of a rising chain of length k + 1.
tails = []
values.each do |value|
  tails[tails.bsearch_index { |tail| tail >= value } || tails.size] = value
end
tails.size
end
