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
  local groups = #docks
  for _, pair in ipairs(links) do
    local ra, rb = find(pair[1]), find(pair[2])
    if ra ~= rb then
      parent[ra] = rb
      groups = groups - 1
    end
  end
  return groups
end
