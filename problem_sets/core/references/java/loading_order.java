    Comparator<String> byCodePoint = (x, y) -> Arrays.compare(x.codePoints().toArray(), y.codePoints().toArray());
    Map<String, Set<String>> needs = new HashMap<>();
    Map<String, Set<String>> users = new HashMap<>();
    deps.forEach((item, before) -> {
        needs.computeIfAbsent(item, key -> new HashSet<>());
        for (String other : before) {
            needs.computeIfAbsent(other, key -> new HashSet<>());
            needs.get(item).add(other);
            users.computeIfAbsent(other, key -> new HashSet<>()).add(item);
        }
    });
    Map<String, Integer> remaining = new HashMap<>();
    PriorityQueue<String> ready = new PriorityQueue<>(byCodePoint);
    needs.forEach((item, prereqs) -> {
        remaining.put(item, prereqs.size());
        if (prereqs.isEmpty()) {
            ready.add(item);
        }
    });
    List<String> order = new ArrayList<>();
    while (!ready.isEmpty()) {
        String item = ready.poll();
        order.add(item);
        for (String user : users.getOrDefault(item, Set.of())) {
            if (remaining.merge(user, -1, Integer::sum) == 0) {
                ready.add(user);
            }
        }
    }
    return order.size() == needs.size() ? order : null;
}
