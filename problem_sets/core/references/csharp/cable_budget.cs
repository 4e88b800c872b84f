    var parent = docks.ToDictionary(dock => dock, dock => dock);
    Func<string, string> find = x =>
    {
        while (parent[x] != x)
        {
            parent[x] = parent[parent[x]];
            x = parent[x];
        }
        return x;
    };
    // Kruskal: the cheapest cable that joins two separate networks is always worth laying.
    long total = 0;
    int joined = 0;
    foreach (var cable in cables.OrderBy(option => option.Item3))
    {
        var (a, b, cost) = cable;
        string rootA = find(a);
        string rootB = find(b);
        if (rootA != rootB)
        {
            parent[rootA] = rootB;
            total += cost;
            joined++;
        }
    }
    if (docks.Count > 1 && joined != docks.Count - 1)
    {
        return null;
    }
    return total;
}
