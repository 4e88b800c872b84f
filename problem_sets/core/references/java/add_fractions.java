    long num = 0;
    long den = 1;
    for (Pair<Long, Long> fraction : fracs) {
        long p = fraction.first();
        long q = fraction.second();
        num = num * q + p * den;
        den = den * q;
        if (den < 0) {
            num = -num;
            den = -den;
        }
        long a = Math.abs(num);
        long b = den;
        while (b != 0) {
            long r = a % b;
            a = b;
            b = r;
        }
        num /= a;
        den /= a;
    }
    return new Pair<>(num, den);
}
