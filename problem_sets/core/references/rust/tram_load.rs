let mut on_board = 0;
let mut refused = 0;
for (alighting, boarding) in stops {
    on_board -= alighting.min(on_board);
    let taken = boarding.min(capacity - on_board);
    on_board += taken;
    refused += boarding - taken;
}
(on_board, refused)
}
