    long sum = 0;
    for (long mark : marks) {
        sum += mark;
    }
    return new Pair<>((long) entries.codePointCount(0, entries.length()), sum);
}
