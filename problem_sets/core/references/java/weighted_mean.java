    double total = 0.0;
    double weightSum = 0.0;
    for (int i = 0; i < values.size(); i++) {
        total += values.get(i) * weights.get(i);
        weightSum += weights.get(i);
    }
    if (weightSum == 0.0) {
        return null;
    }
    return total / weightSum;
}
