    int[] x = a.codePoints().toArray();
    int[] y = b.codePoints().toArray();
    if (x.length != y.length) {
        return null;
    }
    long differences = 0;
    for (int i = 0; i < x.length; i++) {
        if (x[i] != y[i]) {
            differences++;
        }
    }
    return differences;
}
