return 0 if start == goal

graph = Hash.new { |hash, island| hash[island] = [] }
routes.each do |a, b, cost|
  graph[a] << [b, cost]
  graph[b] << [a, cost]
end
# Dijkstra's algorithm, picking the nearest unsettled island by a scan.
best = { start => 0 }
settled = Set.new
loop do
  island, dist = best.reject { |name, _| settled.include?(name) }.min_by { |_, d| d }
  return nil if island.nil?
  return dist if island == goal

  settled << island
  graph[island].each do |neighbour, cost|
    candidate = dist + cost
    best[neighbour] = candidate if best[neighbour].nil? || candidate < best[neighbour]
  end
end
end
