    if (depths.Count == 0)
    {
        return null;
    }
    var sorted = new List<double>(depths);
    sorted.Sort();
    int mid = sorted.Count / 2;
    if (sorted.Count % 2 == 1)
    {
        return sorted[mid];
    }
    return (sorted[mid - 1] + sorted[mid]) / 2.0;
}
