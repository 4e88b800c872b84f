    var seen = new HashSet<string>();
    foreach (string ticket in tickets)
    {
        if (!seen.Add(ticket))
        {
            return ticket;
        }
    }
    return null;
}
