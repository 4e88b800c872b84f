  if utf8.len(a) ~= utf8.len(b) then
    return nil
  end
  local right = {}
  for flag in b:gmatch(utf8.charpattern) do
    right[#right + 1] = flag
  end
  local differ, i = 0, 0
  for flag in a:gmatch(utf8.charpattern) do
    i = i + 1
    if flag ~= right[i] then
      differ = differ + 1
    end
  end
  return differ
end
