    if (readings.isEmpty()) {
        return 0;
    }
    return Collections.max(readings) - Collections.min(readings);
}
