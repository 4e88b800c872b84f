    if (values.isEmpty()) {
        return 0.0;
    }
    double mean = 0.0;
    for (double value : values) {
        mean += value;
    }
    mean /= values.size();
    double squares = 0.0;
    for (double value : values) {
        squares += (value - mean) * (value - mean);
    }
    return Math.sqrt(squares / values.size());
}
