positions.each_cons(2).map { |before, after| after - before }
end
