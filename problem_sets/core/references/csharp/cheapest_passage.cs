    if (start == goal)
    {
        return 0;
    }
    // Mono's compiler does not parse a tuple type nested two generics deep, so the edge type
    // is spelled ValueTuple<string, long>, which is the same type as (string, long).
    var graph = new Dictionary<string, List<ValueTuple<string, long>>>();
    Action<string, string, long> link = (origin, destination, cost) =>
    {
        if (!graph.TryGetValue(origin, out var edges))
        {
            edges = new List<ValueTuple<string, long>>();
            graph[origin] = edges;
        }
        edges.Add((destination, cost));
    };
    foreach (var route in routes)
    {
        var (a, b, cost) = route;
        link(a, b, cost);
        link(b, a, cost);
    }
    // Dijkstra, with a sorted set of (distance, island) as the priority queue; an island's
    // entry is replaced when a cheaper way to it is found.
    var best = new Dictionary<string, long> { [start] = 0 };
    var queue = new SortedSet<(long, string)>(Comparer<(long, string)>.Create(
        (x, y) => x.Item1 != y.Item1 ? x.Item1.CompareTo(y.Item1) : string.CompareOrdinal(x.Item2, y.Item2)));
    queue.Add((0, start));
    while (queue.Count > 0)
    {
        var (dist, island) = queue.Min;
        queue.Remove((dist, island));
        if (island == goal)
        {
            return dist;
        }
        if (!graph.TryGetValue(island, out var edges))
        {
            continue;
        }
        foreach (var edge in edges)
        {
            var (next, cost) = edge;
            long candidate = dist + cost;
            if (best.TryGetValue(next, out var known))
            {
                if (candidate >= known)
                {
                    continue;
                }
                queue.Remove((known, next));
            }
            best[next] = candidate;
            queue.Add((candidate, next));
        }
    }
    return null;
}
