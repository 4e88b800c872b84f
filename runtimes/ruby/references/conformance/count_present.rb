present = readings.compact
[present.sum, readings.size - present.size]
end
