# best[r]: the largest worth of a load weighing at most r, over the crates seen so far.
best = Array.new(capacity + 1, 0)
weights.zip(values).each do |weight, value|
  capacity.downto(weight) do |room|
    loaded = best[room - weight] + value
    best[room] = loaded if loaded > best[room]
  end
end
best[capacity]
end
