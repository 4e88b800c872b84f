    return [map { $_ ? 0 : 1 } @$flags];
}
