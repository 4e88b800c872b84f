value
end
