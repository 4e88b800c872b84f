    // Code points; a surrogate pair is one.
    Func<string, List<int>> codePoints = s =>
    {
        var points = new List<int>();
        for (int i = 0; i < s.Length; i++)
        {
            if (char.IsSurrogatePair(s, i))
            {
                points.Add(char.ConvertToUtf32(s[i], s[i + 1]));
                i++;
            }
            else
            {
                points.Add(s[i]);
            }
        }
        return points;
    };
    var chars = codePoints(text);
    // matches[j]: the pattern read so far matches the first j characters of the text.
    var matches = new bool[chars.Count + 1];
    matches[0] = true;
    foreach (int p in codePoints(pattern))
    {
        var next = new bool[chars.Count + 1];
        if (p == '*')
        {
            bool seen = false;
            for (int j = 0; j <= chars.Count; j++)
            {
                seen = seen || matches[j];
                next[j] = seen;
            }
        }
        else
        {
            for (int j = 1; j <= chars.Count; j++)
            {
                next[j] = matches[j - 1] && (p == '?' || p == chars[j - 1]);
            }
        }
        matches = next;
    }
    return matches[chars.Count];
}
