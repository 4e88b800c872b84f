// A power of two has exactly one bit set, which clearing the lowest set bit removes.
return n > 0n && (n & (n - 1n)) === 0n;
}
