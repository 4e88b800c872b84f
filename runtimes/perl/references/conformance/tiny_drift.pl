    return [map { $_ * $factor } @$offsets];
}
