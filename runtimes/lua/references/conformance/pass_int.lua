  return value
end
