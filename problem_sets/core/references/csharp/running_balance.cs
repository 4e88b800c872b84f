    var balances = new List<long>(deltas.Count);
    long balance = 0;
    foreach (long delta in deltas)
    {
        balance += delta;
        balances.Add(balance);
    }
    return balances;
}
