    var averages = new List<double>();
    for (long i = window - 1; i < values.Count; i++)
    {
        double total = 0.0;
        for (long j = i - window + 1; j <= i; j++)
        {
            total += values[(int)j];
        }
        averages.Add(total / window);
    }
    return averages;
}
