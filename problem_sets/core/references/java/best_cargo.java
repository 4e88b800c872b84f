    long[] best = new long[(int) capacity + 1];
    for (int i = 0; i < weights.size(); i++) {
        int weight = (int) Math.min(weights.get(i), capacity + 1);
        long value = values.get(i);
        for (int room = (int) capacity; room >= weight; room--) {
            best[room] = Math.max(best[room], best[room - weight] + value);
        }
    }
    return best[(int) capacity];
}
