nodes = (adj.keys + adj.values.flatten).uniq
# Everything reachable from each lighthouse along one or more links.
reach = nodes.to_h do |node|
  seen = Set.new
  stack = adj.fetch(node, []).dup
  until stack.empty?
    nxt = stack.pop
    stack.concat(adj.fetch(nxt, [])) if seen.add?(nxt)
  end
  [node, seen]
end
# A lighthouse that reaches itself lies on a loop: every lighthouse it reaches that reaches it
# back.
assigned = Set.new
nodes.count do |node|
  next false if assigned.include?(node) || !reach[node].include?(node)

  reach[node].each { |other| assigned << other if reach[other].include?(node) }
  true
end
end
