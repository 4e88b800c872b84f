    if (readings.Count == 0)
    {
        return 0;
    }
    return readings.Max() - readings.Min();
}
