    // tails[k]: the smallest last reading of a rising chain of k + 1 readings seen so far;
    // it is strictly increasing, so a binary search finds where each reading goes.
    var tails = new List<long>();
    foreach (long value in values)
    {
        int position = tails.BinarySearch(value);
        if (position < 0)
        {
            position = ~position;
        }
        if (position == tails.Count)
        {
            tails.Add(value);
        }
        else
        {
            tails[position] = value;
        }
    }
    return tails.Count;
}
