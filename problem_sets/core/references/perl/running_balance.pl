    my $balance = 0;
    return [map { $balance += $_ } @$deltas];
}
