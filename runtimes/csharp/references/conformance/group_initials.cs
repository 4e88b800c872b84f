    var groups = new Dictionary<string, List<string>>();
    foreach (string name in names)
    {
        if (name.Length == 0)
        {
            continue;
        }
        string initial = char.ConvertFromUtf32(char.ConvertToUtf32(name, 0));
        List<string> group;
        if (!groups.TryGetValue(initial, out group))
        {
            group = new List<string>();
            groups[initial] = group;
        }
        group.Add(name);
    }
    return groups;
}
