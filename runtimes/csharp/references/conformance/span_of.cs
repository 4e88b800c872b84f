    if (values.Count == 0)
    {
        return null;
    }
    return (values.Min(), values.Max());
}
