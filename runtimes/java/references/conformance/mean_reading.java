    if (readings.isEmpty()) {
        return 0.0;
    }
    double total = 0.0;
    for (double reading : readings) {
        total += reading;
    }
    return total / readings.size();
}
