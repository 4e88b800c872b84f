    List<Double> averages = new ArrayList<>();
    for (int i = (int) window - 1; i < values.size(); i++) {
        double sum = 0.0;
        for (int k = i - (int) window + 1; k <= i; k++) {
            sum += values.get(k);
        }
        averages.add(sum / window);
    }
    return averages;
}
