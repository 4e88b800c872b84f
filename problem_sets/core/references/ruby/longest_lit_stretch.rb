best = 0
run = 0
states.each do |lit|
  run = lit ? run + 1 : 0
  best = run if run > best
end
best
end
