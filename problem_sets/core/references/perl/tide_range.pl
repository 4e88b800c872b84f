    return 0 unless @$readings;
    my ($low, $high) = ($readings->[0], $readings->[0]);
    for my $reading (@$readings) {
        $low = $reading if $reading < $low;
        $high = $reading if $reading > $high;
    }
    return $high - $low;
}
