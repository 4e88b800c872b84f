  local count = 0
  for _, name in ipairs(names) do
    if utf8.len(name) >= min_length then
      count = count + 1
    end
  end
  return count
end
