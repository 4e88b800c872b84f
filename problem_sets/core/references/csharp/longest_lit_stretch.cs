    long best = 0;
    long run = 0;
    foreach (bool lit in states)
    {
        run = lit ? run + 1 : 0;
        best = Math.Max(best, run);
    }
    return best;
}
