    # NaN is the only value that is not equal to itself.
    return [map { $_ != $_ ? $fill : $_ } @$readings];
}
