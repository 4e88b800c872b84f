    Map<String, String> parent = new HashMap<>();
    for (String dock : docks) {
        parent.put(dock, dock);
    }
    Function<String, String> find = new Function<>() {
        public String apply(String x) {
            while (!parent.get(x).equals(x)) {
                parent.put(x, parent.get(parent.get(x)));
                x = parent.get(x);
            }
            return x;
        }
    };
    long groups = docks.size();
    for (Pair<String, String> link : links) {
        String ra = find.apply(link.first());
        String rb = find.apply(link.second());
        if (!ra.equals(rb)) {
            parent.put(ra, rb);
            groups--;
        }
    }
    return groups;
}
