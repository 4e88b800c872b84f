    return undef unless @$depths;
    my @sorted = sort { $a <=> $b } @$depths;
    my $mid = int(@sorted / 2);
    return @sorted % 2 ? $sorted[$mid] : ($sorted[$mid - 1] + $sorted[$mid]) / 2;
}
