    ulong divisor = 0;
    foreach (long count in counts)
    {
        // The magnitude as a ulong: negating long.MinValue wraps to itself, which reads as 2^63.
        ulong a = divisor;
        ulong b = count < 0 ? (ulong)(-count) : (ulong)count;
        while (b != 0)
        {
            (a, b) = (b, a % b);
        }
        divisor = a;
    }
    return (long)divisor;
}
