stock[item]
end
