  local waits = {}
  local t = interval
  local i = 1
  while i <= #arrivals do
    if arrivals[i] > t then
      -- Nobody is waiting: skip to the first departure at or after the next arrival.
      t = (arrivals[i] + interval - 1) // interval * interval
    end
    local boarded = 0
    while i <= #arrivals and boarded < capacity and arrivals[i] <= t do
      waits[i] = t - arrivals[i]
      boarded = boarded + 1
      i = i + 1
    end
    t = t + interval
  end
  return waits
end
