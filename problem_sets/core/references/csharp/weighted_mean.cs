    double total = 0.0;
    double totalWeight = 0.0;
    for (int i = 0; i < values.Count; i++)
    {
        total += values[i] * weights[i];
        totalWeight += weights[i];
    }
    if (totalWeight == 0.0)
    {
        return null;
    }
    return total / totalWeight;
}
