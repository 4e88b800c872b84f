    // A surrogate pair is one code point.
    Func<string, List<string>> codePoints = text =>
    {
        var points = new List<string>();
        for (int i = 0; i < text.Length; )
        {
            int width = char.IsSurrogatePair(text, i) ? 2 : 1;
            points.Add(text.Substring(i, width));
            i += width;
        }
        return points;
    };
    var left = codePoints(a);
    var right = codePoints(b);
    if (left.Count != right.Count)
    {
        return null;
    }
    long differences = 0;
    for (int i = 0; i < left.Count; i++)
    {
        if (left[i] != right[i])
        {
            differences++;
        }
    }
    return differences;
}
