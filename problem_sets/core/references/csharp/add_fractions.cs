    Func<long, long, long> gcd = (a, b) =>
    {
        a = Math.Abs(a);
        b = Math.Abs(b);
        while (b != 0)
        {
            (a, b) = (b, a % b);
        }
        return a;
    };
    long num = 0;
    long den = 1;
    foreach (var fraction in fracs)
    {
        var (p, q) = fraction;
        num = num * q + p * den;
        den *= q;
        if (den < 0)
        {
            num = -num;
            den = -den;
        }
        long common = gcd(num, den);
        num /= common;
        den /= common;
    }
    return (num, den);
}
