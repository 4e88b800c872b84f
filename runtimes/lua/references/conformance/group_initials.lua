  local groups = {}
  for _, name in ipairs(names) do
    if name ~= "" then
      local initial = name:sub(1, utf8.offset(name, 2) - 1)
      groups[initial] = groups[initial] or {}
      table.insert(groups[initial], name)
    end
  end
  return groups
end
