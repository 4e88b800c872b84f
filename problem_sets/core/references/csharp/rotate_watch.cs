    if (crew.Count == 0)
    {
        return new List<string>();
    }
    int places = (int)(k % crew.Count);
    return crew.Skip(places).Concat(crew.Take(places)).ToList();
}
