    if (start == goal)
    {
        return 0;
    }
    var hops = new Dictionary<string, long> { [start] = 0 };
    var queue = new Queue<string>();
    queue.Enqueue(start);
    while (queue.Count > 0)
    {
        string dock = queue.Dequeue();
        if (!adj.TryGetValue(dock, out var destinations))
        {
            continue;
        }
        foreach (string next in destinations)
        {
            if (hops.ContainsKey(next))
            {
                continue;
            }
            hops[next] = hops[dock] + 1;
            if (next == goal)
            {
                return hops[next];
            }
            queue.Enqueue(next);
        }
    }
    return null;
}
