    const string digits = "0123456789abcdefghijklmnopqrstuvwxyz";
    if (n == 0)
    {
        return "0";
    }
    // The magnitude as a ulong: negating long.MinValue wraps to itself, which reads as 2^63.
    ulong rest = n < 0 ? (ulong)(-n) : (ulong)n;
    ulong radix = (ulong)@base;
    var text = new StringBuilder();
    while (rest > 0)
    {
        text.Insert(0, digits[(int)(rest % radix)]);
        rest /= radix;
    }
    if (n < 0)
    {
        text.Insert(0, '-');
    }
    return text.ToString();
}
