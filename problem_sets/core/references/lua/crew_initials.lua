  local initials = {}
  for word in full_name:gmatch("[^ ]+") do
    local first = word:match("^" .. utf8.charpattern)
    if first:find("^[a-z]$") then
      first = first:upper()
    end
    initials[#initials + 1] = first
  end
  return table.concat(initials)
end
