return 0.0 if values.empty?

mean = values.sum / values.size
Math.sqrt(values.sum { |value| (value - mean)**2 } / values.size)
end
