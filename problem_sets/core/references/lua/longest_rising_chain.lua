  -- tails[k] is the smallest last value of a strictly rising chain of length k.
  local tails = {}
  for _, value in ipairs(values) do
    local lo, hi = 1, #tails + 1
    while lo < hi do
      local mid = (lo + hi) // 2
      if tails[mid] < value then
        lo = mid + 1
      else
        hi = mid
      end
    end
    tails[lo] = value
  end
  return #tails
end
