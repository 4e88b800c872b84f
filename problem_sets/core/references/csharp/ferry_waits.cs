    var waits = new List<long>(arrivals.Count);
    long departure = interval;
    int i = 0;
    while (i < arrivals.Count)
    {
        if (arrivals[i] > departure)
        {
            // Nobody is waiting: jump to the first departure at or after the next arrival.
            departure = (arrivals[i] + interval - 1) / interval * interval;
        }
        long boarded = 0;
        while (i < arrivals.Count && boarded < capacity && arrivals[i] <= departure)
        {
            waits.Add(departure - arrivals[i]);
            boarded++;
            i++;
        }
        departure += interval;
    }
    return waits;
}
