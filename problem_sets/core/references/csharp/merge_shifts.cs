    var merged = new List<(long, long)>();
    foreach (var shift in shifts.OrderBy(s => s.Item1).ThenBy(s => s.Item2))
    {
        var (start, end) = shift;
        if (merged.Count > 0)
        {
            var (lastStart, lastEnd) = merged[merged.Count - 1];
            // start - 1 is only computed when start > lastEnd, so it cannot overflow.
            if (start <= lastEnd || start - 1 == lastEnd)
            {
                merged[merged.Count - 1] = (lastStart, Math.Max(lastEnd, end));
                continue;
            }
        }
        merged.Add((start, end));
    }
    return merged;
}
