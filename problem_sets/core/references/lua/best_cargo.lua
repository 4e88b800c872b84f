  -- best[r] is the largest worth that fits in r tonnes using the crates seen so far.
  local best = {}
  for r = 0, capacity do
    best[r] = 0
  end
  for i, weight in ipairs(weights) do
    for r = capacity, weight, -1 do
      best[r] = math.max(best[r], best[r - weight] + values[i])
    end
  end
  return best[capacity]
end
