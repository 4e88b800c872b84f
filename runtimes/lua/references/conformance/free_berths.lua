  local free = {}
  for berth = 1, count do
    if not taken[berth] then
      free[berth] = true
    end
  end
  return free
end
