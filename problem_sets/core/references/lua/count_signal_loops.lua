  -- Tarjan's algorithm: every strongly connected component is a candidate loop.
  local index, low, on_stack, stack = {}, {}, {}, {}
  local counter, loops = 0, 0
  local function visit(node)
    counter = counter + 1
    index[node], low[node] = counter, counter
    stack[#stack + 1] = node
    on_stack[node] = true
    local self_link = false
    for _, next_node in ipairs(adj[node] or {}) do
      if next_node == node then
        self_link = true
      end
      if index[next_node] == nil then
        visit(next_node)
        low[node] = math.min(low[node], low[next_node])
      elseif on_stack[next_node] then
        low[node] = math.min(low[node], index[next_node])
      end
    end
    if low[node] ~= index[node] then
      return
    end
    local size = 0
    repeat
      local top = table.remove(stack)
      on_stack[top] = false
      size = size + 1
    until top == node
    if size > 1 or self_link then
      loops = loops + 1
    end
  end
  for node in pairs(adj) do
    if index[node] == nil then
      visit(node)
    end
  end
  return loops
end
