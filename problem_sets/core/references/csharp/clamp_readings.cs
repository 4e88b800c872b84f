    var limited = new List<long>(values.Count);
    foreach (long value in values)
    {
        if (low.HasValue && value < low.Value)
        {
            limited.Add(low.Value);
        }
        else if (high.HasValue && value > high.Value)
        {
            limited.Add(high.Value);
        }
        else
        {
            limited.Add(value);
        }
    }
    return limited;
}
