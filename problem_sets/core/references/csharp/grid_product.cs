    var product = new List<List<long>>();
    if (a.Count == 0)
    {
        return product;
    }
    int columns = b[0].Count;
    foreach (var row in a)
    {
        var line = new List<long>(columns);
        for (int j = 0; j < columns; j++)
        {
            long total = 0;
            for (int t = 0; t < row.Count; t++)
            {
                total += row[t] * b[t][j];
            }
            line.Add(total);
        }
        product.Add(line);
    }
    return product;
}
