    return [
        map {
            defined $low && $_ < $low ? $low
            : defined $high && $_ > $high ? $high
            : $_
        } @$values
    ];
}
