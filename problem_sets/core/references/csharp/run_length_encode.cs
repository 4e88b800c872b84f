    var code = new StringBuilder();
    int i = 0;
    while (i < text.Length)
    {
        // A run of one code point: both halves of a surrogate pair count as one.
        int width = char.IsSurrogatePair(text, i) ? 2 : 1;
        string glyph = text.Substring(i, width);
        long length = 0;
        while (i + width <= text.Length && string.CompareOrdinal(text, i, glyph, 0, width) == 0)
        {
            length++;
            i += width;
        }
        code.Append(length).Append(glyph);
    }
    return code.ToString();
}
