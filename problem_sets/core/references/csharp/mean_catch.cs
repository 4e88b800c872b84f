    if (weights.Count == 0)
    {
        return null;
    }
    double total = 0.0;
    foreach (double weight in weights)
    {
        total += weight;
    }
    return total / weights.Count;
}
