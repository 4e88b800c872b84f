    my @totals;
    for my $row (@$grid) {
        $totals[$_] += $row->[$_] for 0 .. $#$row;
    }
    return \@totals;
}
