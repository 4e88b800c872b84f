  -- Recursive descent. A division by zero is noted and yields 0 so that the rest of the
  -- expression is still evaluated.
  local pos = 1
  local division_by_zero = false
  local function peek()
    pos = expr:find("[^ ]", pos) or #expr + 1
    return expr:sub(pos, pos)
  end
  local sum
  local function atom()
    if peek() == "(" then
      pos = pos + 1
      local value = sum()
      peek()
      pos = pos + 1 -- the closing parenthesis
      return value
    end
    local digits = expr:match("^%d+", pos)
    pos = pos + #digits
    return math.tointeger(tonumber(digits))
  end
  local function unary()
    if peek() == "-" then
      pos = pos + 1
      return -unary()
    end
    return atom()
  end
  local function product()
    local value = unary()
    local op = peek()
    while op == "*" or op == "/" do
      pos = pos + 1
      local right = unary()
      if op == "*" then
        value = value * right
      elseif right == 0 then
        division_by_zero = true
        value = 0
      else
        -- Lua's // rounds toward minus infinity; the quotient must be truncated toward zero.
        local quotient = value // right
        if value % right ~= 0 and (value < 0) ~= (right < 0) then
          quotient = quotient + 1
        end
        value = quotient
      end
      op = peek()
    end
    return value
  end
  function sum()
    local value = product()
    local op = peek()
    while op == "+" or op == "-" do
      pos = pos + 1
      local right = product()
      value = op == "+" and value + right or value - right
      op = peek()
    end
    return value
  end
  local value = sum()
  if division_by_zero then
    return nil
  end
  return value
end
