    List<Long> waits = new ArrayList<>();
    long t = interval;
    int i = 0;
    while (i < arrivals.size()) {
        if (arrivals.get(i) > t) {
            t = (arrivals.get(i) + interval - 1) / interval * interval;
        }
        long boarded = 0;
        while (i < arrivals.size() && boarded < capacity && arrivals.get(i) <= t) {
            waits.add(t - arrivals.get(i));
            boarded++;
            i++;
        }
        t += interval;
    }
    return waits;
}
