    return 0.0 unless @$values;
    my $mean = 0;
    $mean += $_ for @$values;
    $mean /= @$values;
    my $variance = 0;
    $variance += ($_ - $mean) ** 2 for @$values;
    return sqrt($variance / @$values);
}
