    var row = new List<long> { 1 };
    for (long i = 0; i < n; i++)
    {
        var next = new List<long> { 1 };
        for (int k = 1; k < row.Count; k++)
        {
            next.Add(row[k - 1] + row[k]);
        }
        next.Add(1);
        row = next;
    }
    return row;
}
