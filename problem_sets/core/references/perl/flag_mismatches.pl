    # The strings are character strings, so length and substr work on code points.
    return undef unless length $a_ == length $b_;
    return scalar grep { substr($a_, $_, 1) ne substr($b_, $_, 1) } 0 .. length($a_) - 1;
}
