    var groups = new Dictionary<string, List<string>>();
    foreach (string word in words)
    {
        if (word.Length == 0)
        {
            continue;
        }
        // The first code point: both halves of a surrogate pair.
        string initial = word.Substring(0, char.IsSurrogatePair(word, 0) ? 2 : 1);
        if (!groups.TryGetValue(initial, out var group))
        {
            group = new List<string>();
            groups[initial] = group;
        }
        group.Add(word);
    }
    return groups;
}
