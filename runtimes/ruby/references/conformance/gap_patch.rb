readings.map { |reading| reading.nan? ? fill : reading }
end
