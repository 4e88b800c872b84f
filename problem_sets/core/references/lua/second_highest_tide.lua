  local top, second
  for _, value in ipairs(values) do
    if top == nil or value > top then
      second = top
      top = value
    elseif value < top and (second == nil or value > second) then
      second = value
    end
  end
  return second
end
