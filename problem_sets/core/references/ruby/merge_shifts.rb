shifts.sort.each_with_object([]) do |(start, finish), merged|
  last = merged.last
  if last && start <= last[1] + 1
    last[1] = finish if finish > last[1]
  else
    merged << [start, finish]
  end
end
end
