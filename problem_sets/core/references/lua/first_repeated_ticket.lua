  local seen = {}
  for _, code in ipairs(tickets) do
    if seen[code] then
      return code
    end
    seen[code] = true
  end
  return nil
end
