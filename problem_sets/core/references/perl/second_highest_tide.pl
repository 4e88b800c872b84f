    my ($top, $second);
    for my $value (@$values) {
        if (!defined $top || $value > $top) {
            $second = $top;
            $top = $value;
        } elsif ($value < $top && (!defined $second || $value > $second)) {
            $second = $value;
        }
    }
    return $second;
}
