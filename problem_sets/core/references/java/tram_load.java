    long onBoard = 0;
    long refused = 0;
    for (Pair<Long, Long> stop : stops) {
        onBoard -= Math.min(onBoard, stop.first());
        long boarding = Math.min(stop.second(), capacity - onBoard);
        onBoard += boarding;
        refused += stop.second() - boarding;
    }
    return new Pair<>(onBoard, refused);
}
