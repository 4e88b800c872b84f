    return Long.toString(n, (int) base);
}
