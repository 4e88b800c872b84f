    record Edge(String to, long cost) {}
    record Visit(long dist, String island) {}
    Map<String, List<Edge>> graph = new HashMap<>();
    for (Triple<String, String, Long> route : routes) {
        graph.computeIfAbsent(route.first(), key -> new ArrayList<>()).add(new Edge(route.second(), route.third()));
        graph.computeIfAbsent(route.second(), key -> new ArrayList<>()).add(new Edge(route.first(), route.third()));
    }
    Map<String, Long> best = new HashMap<>();
    best.put(start, 0L);
    PriorityQueue<Visit> heap = new PriorityQueue<>(Comparator.comparingLong(Visit::dist));
    heap.add(new Visit(0, start));
    while (!heap.isEmpty()) {
        Visit visit = heap.poll();
        if (visit.island().equals(goal)) {
            return visit.dist();
        }
        if (visit.dist() > best.get(visit.island())) {
            continue;
        }
        for (Edge edge : graph.getOrDefault(visit.island(), List.of())) {
            long next = visit.dist() + edge.cost();
            Long known = best.get(edge.to());
            if (known == null || next < known) {
                best.put(edge.to(), next);
                heap.add(new Visit(next, edge.to()));
            }
        }
    }
    return null;
}
