  local best, run = 0, 0
  for _, lit in ipairs(states) do
    run = lit and run + 1 or 0
    best = math.max(best, run)
  end
  return best
end
