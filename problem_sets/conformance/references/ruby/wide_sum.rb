values.sum
end
