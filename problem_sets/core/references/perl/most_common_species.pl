    return undef unless @$species;
    my %count;
    $count{$_}++ for @$species;
    # Highest count first, then the smallest name (cmp compares by code point).
    my ($best) = sort { $count{$b} <=> $count{$a} || $a cmp $b } keys %count;
    return $best;
}
