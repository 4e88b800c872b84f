    var free = new HashSet<long>();
    for (long berth = 1; berth <= count; berth++)
    {
        if (!taken.Contains(berth))
        {
            free.Add(berth);
        }
    }
    return free;
}
