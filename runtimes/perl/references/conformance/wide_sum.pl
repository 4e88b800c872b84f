    my $total = 0;
    $total += $_ for @$values;
    return $total;
}
