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
    // Each item's distinct prerequisites, and for each item the items waiting on it.
    var needs = new Dictionary<string, HashSet<string>>();
    var users = new Dictionary<string, List<string>>();
    Action<string> note = item =>
    {
        if (!needs.ContainsKey(item))
        {
            needs[item] = new HashSet<string>();
            users[item] = new List<string>();
        }
    };
    foreach (var entry in deps)
    {
        note(entry.Key);
        foreach (string other in entry.Value)
        {
            note(other);
            if (needs[entry.Key].Add(other))
            {
                users[other].Add(entry.Key);
            }
        }
    }
    var remaining = needs.ToDictionary(pair => pair.Key, pair => pair.Value.Count);
    var ready = new SortedSet<string>(
        remaining.Where(pair => pair.Value == 0).Select(pair => pair.Key),
        Comparer<string>.Create(byCodePoint));
    var order = new List<string>(needs.Count);
    while (ready.Count > 0)
    {
        string item = ready.Min;
        ready.Remove(item);
        order.Add(item);
        foreach (string user in users[item])
        {
            remaining[user]--;
            if (remaining[user] == 0)
            {
                ready.Add(user);
            }
        }
    }
    return order.Count == needs.Count ? order : null;
}
