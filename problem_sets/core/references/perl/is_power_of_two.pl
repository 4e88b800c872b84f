    # A power of two has exactly one bit set, which clearing the lowest set bit removes.
    return $n > 0 && ($n & ($n - 1)) == 0;
}
