    my ($total, $total_weight) = (0, 0);
    for my $i (0 .. $#$values) {
        $total += $values->[$i] * $weights->[$i];
        $total_weight += $weights->[$i];
    }
    return $total_weight == 0 ? undef : $total / $total_weight;
}
