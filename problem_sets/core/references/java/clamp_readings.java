    List<Long> limited = new ArrayList<>();
    for (long value : values) {
        if (low != null && value < low) {
            value = low;
        }
        if (high != null && value > high) {
            value = high;
        }
        limited.add(value);
    }
    return limited;
}
