    double total = 0.0;
    for (int i = 0; i + 1 < points.size(); i++) {
        Pair<Double, Double> from = points.get(i);
        Pair<Double, Double> to = points.get(i + 1);
        total += Math.hypot(to.first() - from.first(), to.second() - from.second());
    }
    return total;
}
