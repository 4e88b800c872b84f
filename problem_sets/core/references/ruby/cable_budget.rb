# Kruskal's algorithm: cheapest cables first, skipping any that close a cycle.
parent = docks.to_h { |dock| [dock, dock] }
find = lambda do |dock|
  dock = parent[dock] = parent[parent[dock]] until parent[dock] == dock
  dock
end
total = 0
joined = 0
cables.sort_by { |_a, _b, cost| cost }.each do |a, b, cost|
  root_a = find.call(a)
  root_b = find.call(b)
  next if root_a == root_b

  parent[root_a] = root_b
  total += cost
  joined += 1
end
docks.size > 1 && joined != docks.size - 1 ? nil : total
end
