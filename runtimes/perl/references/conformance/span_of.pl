    return undef unless @$values;
    my ($low, $high) = ($values->[0], $values->[0]);
    for my $value (@$values) {
        $low = $value if $value < $low;
        $high = $value if $value > $high;
    }
    return [$low, $high];
}
