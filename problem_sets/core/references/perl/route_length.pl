    my $total = 0.0;
    for my $i (1 .. $#$points) {
        my ($x1, $y1) = @{ $points->[$i - 1] };
        my ($x2, $y2) = @{ $points->[$i] };
        $total += sqrt(($x2 - $x1) ** 2 + ($y2 - $y1) ** 2);
    }
    return $total;
}
