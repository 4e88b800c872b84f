parent = docks.to_h { |dock| [dock, dock] }
find = lambda do |dock|
  dock = parent[dock] = parent[parent[dock]] until parent[dock] == dock
  dock
end
networks = docks.size
links.each do |a, b|
  root_a = find.call(a)
  root_b = find.call(b)
  next if root_a == root_b

  parent[root_a] = root_b
  networks -= 1
end
networks
end
