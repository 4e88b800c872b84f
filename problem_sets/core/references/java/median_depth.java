    if (depths.isEmpty()) {
        return null;
    }
    List<Double> sorted = new ArrayList<>(depths);
    Collections.sort(sorted);
    int middle = sorted.size() / 2;
    if (sorted.size() % 2 == 1) {
        return sorted.get(middle);
    }
    return (sorted.get(middle - 1) + sorted.get(middle)) / 2.0;
}
