crates.values.sum(0.0) { |items| items.values.sum(0.0) }
end
