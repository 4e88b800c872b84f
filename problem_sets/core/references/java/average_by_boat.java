    Map<String, Double> sums = new HashMap<>();
    Map<String, Long> counts = new HashMap<>();
    for (Pair<String, Double> c : catches) {
        sums.merge(c.first(), c.second(), Double::sum);
        counts.merge(c.first(), 1L, Long::sum);
    }
    Map<String, Double> means = new HashMap<>();
    sums.forEach((boat, sum) -> means.put(boat, sum / counts.get(boat)));
    return means;
}
