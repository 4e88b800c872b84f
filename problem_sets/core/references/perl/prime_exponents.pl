    # Trial division: n <= 10^12, so divisors stay below 10^6.
    use integer;
    my %exponents;
    for (my $d = 2; $d * $d <= $n; $d++) {
        while ($n % $d == 0) {
            $exponents{$d}++;
            $n /= $d;
        }
    }
    $exponents{$n}++ if $n > 1;
    return \%exponents;
}
