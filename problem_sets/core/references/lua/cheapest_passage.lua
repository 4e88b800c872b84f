  if start == goal then
    return 0
  end
  local graph = {}
  local function link(from, to, cost)
    graph[from] = graph[from] or {}
    table.insert(graph[from], {to, cost})
  end
  for _, route in ipairs(routes) do
    link(route[1], route[2], route[3])
    link(route[2], route[1], route[3])
  end
  -- Dijkstra without a heap: settle the closest unsettled island each round.
  local best = {[start] = 0}
  local settled = {}
  while true do
    local island
    for name, dist in pairs(best) do
      if not settled[name] and (island == nil or dist < best[island]) then
        island = name
      end
    end
    if island == nil then
      return nil
    end
    if island == goal then
      return best[island]
    end
    settled[island] = true
    for _, leg in ipairs(graph[island] or {}) do
      local to, dist = leg[1], best[island] + leg[2]
      if best[to] == nil or dist < best[to] then
        best[to] = dist
      end
    end
  end
end
