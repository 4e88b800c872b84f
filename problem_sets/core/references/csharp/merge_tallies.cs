    var merged = new Dictionary<string, long>(a);
    foreach (var entry in b)
    {
        merged.TryGetValue(entry.Key, out var count);
        merged[entry.Key] = count + entry.Value;
    }
    return merged;
}
