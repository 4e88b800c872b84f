    // best[room]: the largest worth that fits in room tonnes using the crates seen so far.
    var best = new long[capacity + 1];
    for (int i = 0; i < weights.Count; i++)
    {
        for (long room = capacity; room >= weights[i]; room--)
        {
            best[room] = Math.Max(best[room], best[room - weights[i]] + values[i]);
        }
    }
    return best[capacity];
}
