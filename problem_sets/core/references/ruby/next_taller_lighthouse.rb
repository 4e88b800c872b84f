# A stack of indices still waiting for a taller lighthouse, heights non-increasing.
result = Array.new(heights.size, -1)
waiting = []
heights.each_with_index do |height, i|
  result[waiting.pop] = i while waiting.any? && heights[waiting.last] < height
  waiting << i
end
result
end
