    return '0' if $n == 0;
    # Integer arithmetic on the non-positive value: the absolute value of the most negative
    # integer does not fit. For a negative dividend, % then gives a remainder in (-base, 0]
    # and / truncates toward zero.
    use integer;
    my @digits = ('0' .. '9', 'a' .. 'z');
    my $rest = $n > 0 ? -$n : $n;
    my $text = '';
    while ($rest != 0) {
        $text = $digits[-($rest % $base)] . $text;
        $rest /= $base;
    }
    return ($n < 0 ? '-' : '') . $text;
}
