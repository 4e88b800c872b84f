total_weight = weights.sum
return nil if total_weight.zero?

values.zip(weights).sum { |value, weight| value * weight } / total_weight
end
