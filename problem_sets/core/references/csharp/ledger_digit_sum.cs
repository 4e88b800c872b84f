    // The magnitude as a ulong: negating long.MinValue wraps to itself, which reads as 2^63.
    ulong rest = n < 0 ? (ulong)(-n) : (ulong)n;
    long total = 0;
    while (rest > 0)
    {
        total += (long)(rest % 10);
        rest /= 10;
    }
    return total;
}
