    my @averages;
    for my $end ($window - 1 .. $#$values) {
        my $sum = 0;
        $sum += $_ for @$values[$end - $window + 1 .. $end];
        push @averages, $sum / $window;
    }
    return \@averages;
}
