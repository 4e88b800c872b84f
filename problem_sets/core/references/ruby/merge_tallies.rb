a.merge(b) { |_ship, count_a, count_b| count_a + count_b }
end
