grid.each_with_object([]) do |row, totals|
  row.each_with_index { |value, j| totals[j] = (totals[j] || 0) + value }
end
end
