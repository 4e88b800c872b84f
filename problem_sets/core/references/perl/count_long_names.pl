    # The strings are character strings, so length counts code points.
    return scalar grep { length >= $min_length } @$names;
}
