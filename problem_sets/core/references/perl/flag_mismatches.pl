    # The strings are character strings, so length and substr work on code points.
    return undef unless length $a == length $b;
    return scalar grep { substr($a, $_, 1) ne substr($b, $_, 1) } 0 .. length($a) - 1;
}
