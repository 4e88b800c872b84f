    long sum = 0;
    long missing = 0;
    foreach (long? reading in readings)
    {
        if (reading.HasValue)
        {
            sum += reading.Value;
        }
        else
        {
            missing++;
        }
    }
    return (sum, missing);
}
