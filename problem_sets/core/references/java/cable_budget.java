    Map<String, String> parent = new HashMap<>();
    for (String dock : docks) {
        parent.put(dock, dock);
    }
    UnaryOperator<String> find = new UnaryOperator<>() {
        public String apply(String x) {
            while (!parent.get(x).equals(x)) {
                parent.put(x, parent.get(parent.get(x)));
                x = parent.get(x);
            }
            return x;
        }
    };
    List<Triple<String, String, Long>> sorted = new ArrayList<>(cables);
    sorted.sort(Comparator.comparing((Triple<String, String, Long> cable) -> cable.third()));
    long total = 0;
    int joined = 0;
    for (Triple<String, String, Long> cable : sorted) {
        String ra = find.apply(cable.first());
        String rb = find.apply(cable.second());
        if (!ra.equals(rb)) {
            parent.put(ra, rb);
            total += cable.third();
            joined++;
        }
    }
    if (docks.size() > 1 && joined != docks.size() - 1) {
        return null;
    }
    return total;
}
