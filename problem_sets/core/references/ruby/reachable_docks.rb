# String comparison is by UTF-8 bytes, which orders names by code point.
seen = Set[start]
stack = [start]
until stack.empty?
  adj.fetch(stack.pop, []).each { |dock| stack << dock if seen.add?(dock) }
end
seen.to_a.sort
end
