    my @merged;
    for my $shift (sort { $a->[0] <=> $b->[0] || $a->[1] <=> $b->[1] } @$shifts) {
        my ($start, $end) = @$shift;
        if (@merged && $start <= $merged[-1][1] + 1) {
            $merged[-1][1] = $end if $end > $merged[-1][1];
        } else {
            push @merged, [$start, $end];
        }
    }
    return \@merged;
}
