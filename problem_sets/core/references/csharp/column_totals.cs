    var totals = new List<long>();
    foreach (var row in grid)
    {
        for (int j = 0; j < row.Count; j++)
        {
            if (j == totals.Count)
            {
                totals.Add(0);
            }
            totals[j] += row[j];
        }
    }
    return totals;
}
