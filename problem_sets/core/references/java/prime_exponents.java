    Map<String, Long> factors = new HashMap<>();
    long rest = n;
    for (long p = 2; p * p <= rest; p++) {
        while (rest % p == 0) {
            factors.merge(Long.toString(p), 1L, Long::sum);
            rest /= p;
        }
    }
    if (rest > 1) {
        factors.merge(Long.toString(rest), 1L, Long::sum);
    }
    return factors;
}
