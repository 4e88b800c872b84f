  local result = {}
  -- waiting holds the positions still looking for a taller lighthouse, heights non-increasing.
  local waiting = {}
  for i, height in ipairs(heights) do
    result[i] = -1
    while #waiting > 0 and heights[waiting[#waiting]] < height do
      result[table.remove(waiting)] = i - 1 -- the answer is a 0-based index
    end
    waiting[#waiting + 1] = i
  end
  return result
end
