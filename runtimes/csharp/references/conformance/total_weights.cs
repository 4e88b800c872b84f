    double total = 0.0;
    foreach (var items in crates.Values)
    {
        foreach (double weight in items.Values)
        {
            total += weight;
        }
    }
    return total;
}
