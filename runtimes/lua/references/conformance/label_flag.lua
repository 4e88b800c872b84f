  local name, enabled = entry[1], entry[2]
  return name .. (enabled and ":on" or ":off") .. (suffix or "")
end
