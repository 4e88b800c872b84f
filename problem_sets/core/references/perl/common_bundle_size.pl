    # Euclid's algorithm with integer arithmetic on the signed values, exact even for the most
    # negative integer (whose absolute value does not fit); only the result is made positive.
    use integer;
    my $divisor = 0;
    for my $count (@$counts) {
        my ($x, $y) = ($divisor, $count);
        ($x, $y) = ($y, $x % $y) while $y != 0;
        $divisor = $x;
    }
    return $divisor < 0 ? -$divisor : $divisor;
}
