    long best = 0;
    long run = 0;
    for (boolean lit : states) {
        run = lit ? run + 1 : 0;
        best = Math.max(best, run);
    }
    return best;
}
