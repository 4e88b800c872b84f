    var sums = new Dictionary<string, double>();
    var counts = new Dictionary<string, long>();
    foreach (var entry in catches)
    {
        var (boat, weight) = entry;
        sums.TryGetValue(boat, out var sum);
        sums[boat] = sum + weight;
        counts.TryGetValue(boat, out var count);
        counts[boat] = count + 1;
    }
    return sums.ToDictionary(pair => pair.Key, pair => pair.Value / counts[pair.Key]);
}
