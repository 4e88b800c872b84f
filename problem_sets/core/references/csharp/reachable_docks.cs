    // Code point order. Ordinal comparison orders UTF-16 units, which puts a surrogate (part
    // of a code point above U+FFFF) before U+E000..U+FFFF; ranking surrogates last fixes that.
    Func<char, int> rank = ch => ch >= 0xD800 && ch <= 0xDFFF ? ch + 0x2000 : ch >= 0xE000 ? ch - 0x800 : ch;
    Comparison<string> byCodePoint = (x, y) =>
    {
        for (int i = 0; i < x.Length && i < y.Length; i++)
        {
            if (x[i] != y[i])
            {
                return rank(x[i]) - rank(y[i]);
            }
        }
        return x.Length - y.Length;
    };
    var seen = new HashSet<string> { start };
    var stack = new Stack<string>();
    stack.Push(start);
    while (stack.Count > 0)
    {
        string dock = stack.Pop();
        if (!adj.TryGetValue(dock, out var destinations))
        {
            continue;
        }
        foreach (string next in destinations)
        {
            if (seen.Add(next))
            {
                stack.Push(next);
            }
        }
    }
    var docks = seen.ToList();
    docks.Sort(byCodePoint);
    return docks;
}
