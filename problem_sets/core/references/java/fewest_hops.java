    Map<String, Long> distance = new HashMap<>();
    distance.put(start, 0L);
    Deque<String> queue = new ArrayDeque<>(List.of(start));
    while (!queue.isEmpty()) {
        String dock = queue.poll();
        if (dock.equals(goal)) {
            return distance.get(dock);
        }
        for (String next : adj.getOrDefault(dock, List.of())) {
            if (!distance.containsKey(next)) {
                distance.put(next, distance.get(dock) + 1);
                queue.add(next);
            }
        }
    }
    return null;
}
