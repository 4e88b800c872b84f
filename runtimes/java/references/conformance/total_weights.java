    double total = 0.0;
    for (Map<String, Double> items : crates.values()) {
        for (double weight : items.values()) {
            total += weight;
        }
    }
    return total;
}
