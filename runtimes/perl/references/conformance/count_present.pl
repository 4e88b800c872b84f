    my @present = grep { defined } @$readings;
    my $sum = 0;
    $sum += $_ for @present;
    return [$sum, @$readings - @present];
}
