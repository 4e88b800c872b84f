  local parent = {}
  for _, dock in ipairs(docks) do
    parent[dock] = dock
  end
  local function find(x)
    while parent[x] ~= x do
      parent[x] = parent[parent[x]]
      x = parent[x]
    end
    return x
  end
  -- Kruskal: take the cheapest cables first, skipping any that would close a loop.
  local by_cost = table.move(cables, 1, #cables, 1, {})
  table.sort(by_cost, function(p, q) return p[3] < q[3] end)
  local total, joined = 0, 0
  for _, cable in ipairs(by_cost) do
    local ra, rb = find(cable[1]), find(cable[2])
    if ra ~= rb then
      parent[ra] = rb
      total = total + cable[3]
      joined = joined + 1
    end
  end
  if #docks > 1 and joined ~= #docks - 1 then
    return nil
  end
  return total
end
