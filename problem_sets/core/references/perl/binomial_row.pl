    # Pascal's triangle: only additions, so no intermediate value exceeds the row's entries.
    my @row = (1);
    for (1 .. $n) {
        @row = (1, (map { $row[$_ - 1] + $row[$_] } 1 .. $#row), 1);
    }
    return \@row;
}
