    # \z, not $ (which also matches before a final newline); [0-9], not \d (which also matches
    # digits from other scripts).
    return undef unless $code =~ /\A([A-Z]+)([0-9]{1,18})\z/;
    return [$1, 0 + $2];
}
