  if name == nil or name == "" then
    return string.format("Crate #%d", number)
  end
  return string.format("%s #%d", name, number)
end
