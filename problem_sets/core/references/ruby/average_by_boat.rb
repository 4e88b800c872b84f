catches.group_by(&:first).transform_values do |entries|
  entries.sum { |_boat, weight| weight } / entries.size
end
end
