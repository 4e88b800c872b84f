    List<Double> patched = new ArrayList<>();
    for (double reading : readings) {
        patched.add(Double.isNaN(reading) ? fill : reading);
    }
    return patched;
}
