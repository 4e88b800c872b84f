    return +{ map { ($_ + $offset) => $owners->{$_} } keys %$owners };
}
