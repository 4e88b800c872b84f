    // A surrogate pair is one code point.
    Func<string, long> codePoints = text =>
    {
        long count = 0;
        for (int i = 0; i < text.Length; i += char.IsSurrogatePair(text, i) ? 2 : 1)
        {
            count++;
        }
        return count;
    };
    return names.Count(name => codePoints(name) >= minLength);
}
