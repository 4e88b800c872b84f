    if (values.Count == 0)
    {
        return 0.0;
    }
    double mean = values.Sum() / values.Count;
    double squares = 0.0;
    foreach (double value in values)
    {
        squares += (value - mean) * (value - mean);
    }
    return Math.Sqrt(squares / values.Count);
}
