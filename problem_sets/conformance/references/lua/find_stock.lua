  return stock[item]
end
