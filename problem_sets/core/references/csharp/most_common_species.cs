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
    var counts = new Dictionary<string, long>();
    foreach (string name in species)
    {
        counts.TryGetValue(name, out var count);
        counts[name] = count + 1;
    }
    string best = null;
    foreach (var entry in counts)
    {
        if (best == null || entry.Value > counts[best] || (entry.Value == counts[best] && byCodePoint(entry.Key, best) < 0))
        {
            best = entry.Key;
        }
    }
    return best;
}
