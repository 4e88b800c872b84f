return 0.0 if readings.empty?

readings.sum / readings.size
end
