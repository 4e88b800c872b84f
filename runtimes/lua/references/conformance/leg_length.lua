  for _, text in ipairs(in_) do
    if text == type then
      return end_ - from
    end
  end
  return default
end
