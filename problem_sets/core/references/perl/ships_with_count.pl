    # sort with no block compares strings by code point.
    return [sort grep { $tally->{$_} == $target } keys %$tally];
}
