  local chars = {}
  for _, code in utf8.codes(text) do
    table.insert(chars, 1, utf8.char(code))
  end
  return table.concat(chars)
end
