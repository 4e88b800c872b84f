  local seen = {[start] = true}
  local docks, stack = {start}, {start}
  while #stack > 0 do
    local dock = table.remove(stack)
    for _, next_dock in ipairs(adj[dock] or {}) do
      if not seen[next_dock] then
        seen[next_dock] = true
        docks[#docks + 1] = next_dock
        stack[#stack + 1] = next_dock
      end
    end
  end
  -- The standalone interpreter runs in the C locale, where < compares strings byte by byte:
  -- code point order for UTF-8.
  table.sort(docks)
  return docks
end
