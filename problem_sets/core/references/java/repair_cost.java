    int[] x = a.codePoints().toArray();
    int[] y = b.codePoints().toArray();
    long[] previous = new long[y.length + 1];
    for (int j = 0; j <= y.length; j++) {
        previous[j] = j;
    }
    for (int i = 1; i <= x.length; i++) {
        long[] current = new long[y.length + 1];
        current[0] = i;
        for (int j = 1; j <= y.length; j++) {
            long replace = previous[j - 1] + (x[i - 1] == y[j - 1] ? 0 : 1);
            current[j] = Math.min(replace, Math.min(previous[j], current[j - 1]) + 1);
        }
        previous = current;
    }
    return previous[y.length];
}
