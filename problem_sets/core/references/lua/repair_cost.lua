  -- Levenshtein distance over code points, keeping one row of the table at a time.
  local target = {}
  for ch in b:gmatch(utf8.charpattern) do
    target[#target + 1] = ch
  end
  local prev = {}
  for j = 0, #target do
    prev[j] = j
  end
  local i = 0
  for ca in a:gmatch(utf8.charpattern) do
    i = i + 1
    local cur = {[0] = i}
    for j, cb in ipairs(target) do
      cur[j] = math.min(prev[j] + 1, cur[j - 1] + 1, prev[j - 1] + (ca == cb and 0 or 1))
    end
    prev = cur
  end
  return prev[#target]
end
