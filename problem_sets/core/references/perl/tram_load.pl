    my ($on_board, $refused) = (0, 0);
    for my $stop (@$stops) {
        my ($alighting, $boarding) = @$stop;
        $on_board -= $alighting < $on_board ? $alighting : $on_board;
        my $room = $capacity - $on_board;
        my $taken = $boarding < $room ? $boarding : $room;
        $on_board += $taken;
        $refused += $boarding - $taken;
    }
    return [$on_board, $refused];
}
