    var none = new List<string>();
    Func<string, List<string>> targets = node => adj.TryGetValue(node, out var list) ? list : none;
    var nodes = new HashSet<string>(adj.Keys);
    foreach (var list in adj.Values)
    {
        nodes.UnionWith(list);
    }
    // Everything reachable from each node in one or more links.
    var reach = new Dictionary<string, HashSet<string>>();
    foreach (string node in nodes)
    {
        var seen = new HashSet<string>();
        var stack = new Stack<string>(targets(node));
        while (stack.Count > 0)
        {
            string next = stack.Pop();
            if (seen.Add(next))
            {
                foreach (string after in targets(next))
                {
                    stack.Push(after);
                }
            }
        }
        reach[node] = seen;
    }
    // A node that reaches itself lies on a loop: every node it reaches that reaches it back.
    var assigned = new HashSet<string>();
    long loops = 0;
    foreach (string node in nodes)
    {
        if (assigned.Contains(node) || !reach[node].Contains(node))
        {
            continue;
        }
        foreach (string other in reach[node])
        {
            if (reach[other].Contains(node))
            {
                assigned.Add(other);
            }
        }
        loops++;
    }
    return loops;
}
