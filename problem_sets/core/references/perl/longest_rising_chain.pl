    # $tails[$k]: the smallest last reading of a rising chain of $k + 1 readings seen so far.
    my @tails;
    for my $value (@$values) {
        my ($low, $high) = (0, scalar @tails);
        while ($low < $high) {
            my $mid = ($low + $high) >> 1;
            if ($tails[$mid] < $value) {
                $low = $mid + 1;
            } else {
                $high = $mid;
            }
        }
        $tails[$low] = $value;
    }
    return scalar @tails;
}
