  local letters, digits = code:match("^(%u+)(%d+)$")
  if letters == nil or #digits > 18 then
    return nil
  end
  -- At most 18 digits always fit in a 64-bit integer.
  return {letters, math.tointeger(tonumber(digits))}
end
