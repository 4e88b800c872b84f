    int step = (int)((shift % 26 + 26) % 26);
    var result = new StringBuilder(text.Length);
    foreach (char ch in text)
    {
        if (ch >= 'a' && ch <= 'z')
        {
            result.Append((char)('a' + (ch - 'a' + step) % 26));
        }
        else if (ch >= 'A' && ch <= 'Z')
        {
            result.Append((char)('A' + (ch - 'A' + step) % 26));
        }
        else
        {
            result.Append(ch);
        }
    }
    return result.ToString();
}
