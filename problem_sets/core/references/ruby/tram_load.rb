on_board = 0
refused = 0
stops.each do |alighting, boarding|
  on_board -= [alighting, on_board].min
  taken = [boarding, capacity - on_board].min
  on_board += taken
  refused += boarding - taken
end
[on_board, refused]
end
