waits = []
departure = interval
queue = arrivals.dup
until queue.empty?
  # Skip departures that would leave with nobody waiting.
  departure = (queue.first + interval - 1) / interval * interval if queue.first > departure
  boarding = queue.first(capacity).take_while { |arrival| arrival <= departure }
  queue.shift(boarding.size)
  waits.concat(boarding.map { |arrival| departure - arrival })
  departure += interval
end
waits
end
