    return undef unless @$weights;
    my $total = 0;
    $total += $_ for @$weights;
    return $total / @$weights;
}
