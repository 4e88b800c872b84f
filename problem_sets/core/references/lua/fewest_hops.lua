  if start == goal then
    return 0
  end
  local dist = {[start] = 0}
  local queue = {start}
  local head = 1
  while head <= #queue do
    local dock = queue[head]
    head = head + 1
    for _, next_dock in ipairs(adj[dock] or {}) do
      if dist[next_dock] == nil then
        dist[next_dock] = dist[dock] + 1
        if next_dock == goal then
          return dist[next_dock]
        end
        queue[#queue + 1] = next_dock
      end
    end
  end
  return nil
end
