    List<Double> scaled = new ArrayList<>();
    for (double offset : offsets) {
        scaled.add(offset * factor);
    }
    return scaled;
}
