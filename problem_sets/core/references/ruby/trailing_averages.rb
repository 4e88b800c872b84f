values.each_cons(window).map { |group| group.sum / window }
end
