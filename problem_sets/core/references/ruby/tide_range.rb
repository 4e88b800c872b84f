return 0 if readings.empty?

low, high = readings.minmax
high - low
end
