  local ordered = table.move(shifts, 1, #shifts, 1, {})
  table.sort(ordered, function(p, q)
    if p[1] ~= q[1] then
      return p[1] < q[1]
    end
    return p[2] < q[2]
  end)
  local merged = {}
  for _, shift in ipairs(ordered) do
    local last = merged[#merged]
    if last ~= nil and shift[1] <= last[2] + 1 then
      last[2] = math.max(last[2], shift[2])
    else
      merged[#merged + 1] = {shift[1], shift[2]}
    end
  end
  return merged
end
