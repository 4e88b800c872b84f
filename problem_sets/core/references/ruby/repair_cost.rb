# Levenshtein distance over code points, one row of the table at a time.
target = b.chars
previous = (0..target.size).to_a
a.each_char.with_index(1) do |ca, i|
  current = [i]
  target.each_with_index do |cb, j|
    current << [previous[j + 1] + 1, current[j] + 1, previous[j] + (ca == cb ? 0 : 1)].min
  end
  previous = current
end
previous.last
end
