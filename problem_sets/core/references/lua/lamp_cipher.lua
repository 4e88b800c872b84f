  local step = shift % 26 -- Lua's % with a positive divisor is never negative
  return (text:gsub("[A-Za-z]", function(ch)
    local base = ch:find("%l") and ("a"):byte() or ("A"):byte()
    return string.char((ch:byte() - base + step) % 26 + base)
  end))
end
