  local chars = {}
  for ch in text:gmatch(utf8.charpattern) do
    chars[#chars + 1] = ch
  end
  -- matches[j]: the pattern read so far matches the first j characters of the text.
  local matches = {[0] = true}
  for j = 1, #chars do
    matches[j] = false
  end
  for p in pattern:gmatch(utf8.charpattern) do
    local next_matches = {[0] = false}
    if p == "*" then
      local seen = false
      for j = 0, #chars do
        seen = seen or matches[j]
        next_matches[j] = seen
      end
    else
      for j = 1, #chars do
        next_matches[j] = matches[j - 1] and (p == "?" or p == chars[j])
      end
    end
    matches = next_matches
  end
  return matches[#chars]
end
