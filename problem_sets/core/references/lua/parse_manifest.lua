  local function trim(part)
    return part:match("^[ \t]*(.-)[ \t]*$")
  end
  local totals = {}
  for line in (text .. "\n"):gmatch("(.-)\n") do
    if trim(line) ~= "" then
      local name, quantity = line:match("^([^:]*):(.*)$")
      name = trim(name)
      -- tonumber accepts an optional "+" or "-" sign and gives an integer for digits.
      totals[name] = (totals[name] or 0) + tonumber(trim(quantity))
    end
  end
  return totals
end
