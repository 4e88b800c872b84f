    if (readings.Count == 0)
    {
        return 0.0;
    }
    double total = 0.0;
    foreach (double reading in readings)
    {
        total += reading;
    }
    return total / readings.Count;
}
