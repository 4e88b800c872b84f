    var kept = new StringBuilder();
    foreach (char ch in plate)
    {
        if ((ch >= 'a' && ch <= 'z') || (ch >= '0' && ch <= '9'))
        {
            kept.Append(ch);
        }
        else if (ch >= 'A' && ch <= 'Z')
        {
            kept.Append((char)(ch - 'A' + 'a'));
        }
    }
    for (int i = 0, j = kept.Length - 1; i < j; i++, j--)
    {
        if (kept[i] != kept[j])
        {
            return false;
        }
    }
    return true;
}
