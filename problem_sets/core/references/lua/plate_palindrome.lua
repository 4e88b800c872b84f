  local kept = plate:gsub("[^A-Za-z0-9]", ""):lower()
  return kept == kept:reverse()
end
