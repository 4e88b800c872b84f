    long total = 0;
    for (long value : values) {
        total += value;
    }
    return total;
}
