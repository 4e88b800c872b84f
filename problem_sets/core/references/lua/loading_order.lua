  -- Kahn's algorithm, always loading the smallest ready item. The standalone interpreter runs
  -- in the C locale, where < compares strings byte by byte: code point order for UTF-8.
  local needs, users, items = {}, {}, {}
  local function note(item)
    if needs[item] == nil then
      needs[item], users[item] = {}, {}
      items[#items + 1] = item
    end
  end
  for item, before in pairs(deps) do
    note(item)
    for _, other in ipairs(before) do
      note(other)
      if not needs[item][other] then
        needs[item][other] = true
        table.insert(users[other], item)
      end
    end
  end
  local remaining, ready = {}, {}
  for _, item in ipairs(items) do
    local count = 0
    for _ in pairs(needs[item]) do
      count = count + 1
    end
    remaining[item] = count
    if count == 0 then
      ready[#ready + 1] = item
    end
  end
  local order = {}
  while #ready > 0 do
    table.sort(ready)
    local item = table.remove(ready, 1)
    order[#order + 1] = item
    for _, user in ipairs(users[item]) do
      remaining[user] = remaining[user] - 1
      if remaining[user] == 0 then
        ready[#ready + 1] = user
      end
    end
  end
  if #order ~= #items then
    return nil
  end
  return order
end
