    return Long.bitCount(mask);
}
