    var scaled = new List<double>();
    foreach (double offset in offsets)
    {
        scaled.Add(offset * factor);
    }
    return scaled;
}
