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
    var lines = new List<string>();
    var current = new StringBuilder();
    long currentLength = 0;
    foreach (string word in words)
    {
        long length = codePoints(word);
        if (current.Length == 0)
        {
            current.Append(word);
            currentLength = length;
        }
        else if (currentLength + 1 + length <= width)
        {
            current.Append(' ').Append(word);
            currentLength += 1 + length;
        }
        else
        {
            lines.Add(current.ToString());
            current.Clear().Append(word);
            currentLength = length;
        }
    }
    if (current.Length > 0)
    {
        lines.Add(current.ToString());
    }
    return lines;
}
