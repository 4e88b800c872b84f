    long level;
    if (stock.TryGetValue(item, out level))
    {
        return level;
    }
    return null;
}
