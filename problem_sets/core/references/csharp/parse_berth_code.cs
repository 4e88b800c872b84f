    int letters = 0;
    while (letters < code.Length && code[letters] >= 'A' && code[letters] <= 'Z')
    {
        letters++;
    }
    int digits = code.Length - letters;
    if (letters == 0 || digits == 0 || digits > 18)
    {
        return null;
    }
    long number = 0;
    for (int i = letters; i < code.Length; i++)
    {
        if (code[i] < '0' || code[i] > '9')
        {
            return null;
        }
        number = number * 10 + (code[i] - '0');
    }
    return (code.Substring(0, letters), number);
}
