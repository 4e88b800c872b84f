    long points = 0;
    for (int i = 0; i < entries.Length; i++)
    {
        if (!char.IsLowSurrogate(entries[i]))
        {
            points++;
        }
    }
    return (points, marks.Sum());
}
