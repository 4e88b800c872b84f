  local on_board, refused = 0, 0
  for _, stop in ipairs(stops) do
    local alighting, boarding = stop[1], stop[2]
    on_board = on_board - math.min(alighting, on_board)
    local taken = math.min(boarding, capacity - on_board)
    on_board = on_board + taken
    refused = refused + boarding - taken
  end
  return {on_board, refused}
end
