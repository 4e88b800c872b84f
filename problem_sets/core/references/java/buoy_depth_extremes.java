    if (values.isEmpty()) {
        return null;
    }
    long low = values.get(0);
    long high = values.get(0);
    for (long value : values) {
        low = Math.min(low, value);
        high = Math.max(high, value);
    }
    return new Pair<>(low, high);
}
