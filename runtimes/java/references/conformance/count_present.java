    long sum = 0;
    long missing = 0;
    for (Long reading : readings) {
        if (reading == null) {
            missing++;
        } else {
            sum += reading;
        }
    }
    return new Pair<>(sum, missing);
}
