    my ($best, $run) = (0, 0);
    for my $lit (@$states) {
        $run = $lit ? $run + 1 : 0;
        $best = $run if $run > $best;
    }
    return $best;
}
