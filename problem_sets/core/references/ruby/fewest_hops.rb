return 0 if start == goal

# Breadth-first search: docks are reached in order of their number of trips.
hops = { start => 0 }
queue = [start]
until queue.empty?
  dock = queue.shift
  adj.fetch(dock, []).each do |nxt|
    next if hops.key?(nxt)
    return hops[dock] + 1 if nxt == goal

    hops[nxt] = hops[dock] + 1
    queue << nxt
  end
end
nil
end
