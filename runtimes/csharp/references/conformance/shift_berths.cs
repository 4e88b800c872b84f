    var shifted = new Dictionary<long, string>();
    foreach (KeyValuePair<long, string> entry in owners)
    {
        shifted[entry.Key + offset] = entry.Value;
    }
    return shifted;
}
