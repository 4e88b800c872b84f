    var columns = new List<List<long>>();
    if (grid.Count == 0)
    {
        return columns;
    }
    for (int i = 0; i < grid[0].Count; i++)
    {
        columns.Add(grid.Select(row => row[i]).ToList());
    }
    return columns;
}
