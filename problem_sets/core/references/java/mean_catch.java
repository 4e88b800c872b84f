    if (weights.isEmpty()) {
        return null;
    }
    double total = 0.0;
    for (double weight : weights) {
        total += weight;
    }
    return total / weights.size();
}
