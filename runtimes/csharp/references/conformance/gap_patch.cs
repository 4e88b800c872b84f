    return readings.Select(reading => double.IsNaN(reading) ? fill : reading).ToList();
}
