return nil if weights.empty?

weights.sum / weights.size
end
