    long g = 0;
    for (long count : counts) {
        long a = g;
        long b = Math.abs(count);
        while (b != 0) {
            long r = a % b;
            a = b;
            b = r;
        }
        g = a;
    }
    return g;
}
