    var counts = new Dictionary<string, long>();
    for (int i = 0; i < text.Length; )
    {
        // A surrogate pair is one code point.
        int width = char.IsSurrogatePair(text, i) ? 2 : 1;
        string glyph = text.Substring(i, width);
        counts.TryGetValue(glyph, out var count);
        counts[glyph] = count + 1;
        i += width;
    }
    return counts;
}
