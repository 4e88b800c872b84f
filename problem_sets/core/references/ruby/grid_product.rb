return [] if a.empty?

columns = b.transpose
a.map { |row| columns.map { |column| row.zip(column).sum { |x, y| x * y } } }
end
