values.empty? ? nil : values.minmax
end
