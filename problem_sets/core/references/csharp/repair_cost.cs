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
    var source = codePoints(a);
    var target = codePoints(b);
    // previous[j]: edits turning the source read so far into the first j target characters.
    var previous = new long[target.Count + 1];
    for (int j = 0; j <= target.Count; j++)
    {
        previous[j] = j;
    }
    for (int i = 0; i < source.Count; i++)
    {
        var current = new long[target.Count + 1];
        current[0] = i + 1;
        for (int j = 0; j < target.Count; j++)
        {
            long replace = previous[j] + (source[i] == target[j] ? 0 : 1);
            current[j + 1] = Math.Min(replace, Math.Min(previous[j + 1] + 1, current[j] + 1));
        }
        previous = current;
    }
    return previous[target.Count];
}
