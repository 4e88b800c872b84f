    return 0.0 unless @$readings;
    my $total = 0;
    $total += $_ for @$readings;
    return $total / @$readings;
}
