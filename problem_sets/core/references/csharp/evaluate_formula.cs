    // Recursive descent. long division truncates toward zero, as required, and throws
    // DivideByZeroException for a zero divisor.
    int pos = 0;
    Func<char> peek = () =>
    {
        while (pos < expr.Length && expr[pos] == ' ')
        {
            pos++;
        }
        return pos < expr.Length ? expr[pos] : '\0';
    };
    Func<long> sum = null;
    Func<long> unary = null;
    Func<long> atom = () =>
    {
        if (peek() == '(')
        {
            pos++;
            long inner = sum();
            peek();
            pos++;
            return inner;
        }
        long value = 0;
        while (pos < expr.Length && expr[pos] >= '0' && expr[pos] <= '9')
        {
            value = value * 10 + (expr[pos] - '0');
            pos++;
        }
        return value;
    };
    unary = () =>
    {
        if (peek() == '-')
        {
            pos++;
            return -unary();
        }
        return atom();
    };
    Func<long> product = () =>
    {
        long value = unary();
        for (char op = peek(); op == '*' || op == '/'; op = peek())
        {
            pos++;
            long right = unary();
            value = op == '*' ? value * right : value / right;
        }
        return value;
    };
    sum = () =>
    {
        long value = product();
        for (char op = peek(); op == '+' || op == '-'; op = peek())
        {
            pos++;
            long right = product();
            value = op == '+' ? value + right : value - right;
        }
        return value;
    };
    try
    {
        return sum();
    }
    catch (DivideByZeroException)
    {
        return null;
    }
}
