    long total = 0;
    foreach (long value in values)
    {
        total += value;
    }
    return total;
}
