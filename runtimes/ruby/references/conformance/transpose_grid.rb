return [] if grid.empty? || grid.first.empty?

grid.transpose
end
