    my sub gcd ($x, $y) {
        ($x, $y) = (abs $x, abs $y);
        ($x, $y) = ($y, $x % $y) while $y;
        return $x;
    }
    my ($num, $den) = (0, 1);
    for my $fraction (@$fracs) {
        my ($p, $q) = @$fraction;
        ($p, $q) = (-$p, -$q) if $q < 0;
        # Add over the least common denominator, which keeps the intermediate values small;
        # every division here is exact.
        my $common = $den / gcd($den, $q) * $q;
        $num = $num * ($common / $den) + $p * ($common / $q);
        $den = $common;
        my $divisor = gcd($num, $den);
        ($num, $den) = ($num / $divisor, $den / $divisor);
    }
    return [$num, $den];
}
