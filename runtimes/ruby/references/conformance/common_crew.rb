first & second
end
