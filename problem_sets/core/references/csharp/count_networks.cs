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
    long networks = docks.Count;
    foreach (var cable in links)
    {
        string rootA = find(cable.Item1);
        string rootB = find(cable.Item2);
        if (rootA != rootB)
        {
            parent[rootA] = rootB;
            networks--;
        }
    }
    return networks;
}
