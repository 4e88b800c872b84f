    var factors = new Dictionary<string, long>();
    Action<long> add = prime =>
    {
        string key = prime.ToString(System.Globalization.CultureInfo.InvariantCulture);
        factors.TryGetValue(key, out var exponent);
        factors[key] = exponent + 1;
    };
    // Trial division up to the square root of what is left: at most 10^6 for n <= 10^12.
    long rest = n;
    for (long divisor = 2; divisor * divisor <= rest; divisor += divisor == 2 ? 1 : 2)
    {
        while (rest % divisor == 0)
        {
            add(divisor);
            rest /= divisor;
        }
    }
    if (rest > 1)
    {
        add(rest);
    }
    return factors;
}
