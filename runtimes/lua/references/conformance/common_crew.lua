  local both = {}
  for name in pairs(first) do
    if second[name] then
      both[name] = true
    end
  end
  return both
end
