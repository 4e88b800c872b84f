    var text = new StringBuilder();
    long count = 0;
    for (int i = 0; i < code.Length; )
    {
        char ch = code[i];
        if (ch >= '0' && ch <= '9')
        {
            count = count * 10 + (ch - '0');
            i++;
            continue;
        }
        // The character is one code point: both halves of a surrogate pair.
        int width = char.IsSurrogatePair(code, i) ? 2 : 1;
        string glyph = code.Substring(i, width);
        for (long n = 0; n < count; n++)
        {
            text.Append(glyph);
        }
        count = 0;
        i += width;
    }
    return text.ToString();
}
