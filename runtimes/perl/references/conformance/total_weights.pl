    my $total = 0.0;
    for my $items (values %$crates) {
        $total += $_ for values %$items;
    }
    return $total;
}
