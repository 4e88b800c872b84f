    Long highest = null;
    Long second = null;
    for (long value : values) {
        if (highest == null || value > highest) {
            second = highest;
            highest = value;
        } else if (value < highest && (second == null || value > second)) {
            second = value;
        }
    }
    return second;
}
