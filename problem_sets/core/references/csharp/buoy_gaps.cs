    var gaps = new List<long>();
    for (int i = 1; i < positions.Count; i++)
    {
        gaps.Add(positions[i] - positions[i - 1]);
    }
    return gaps;
}
