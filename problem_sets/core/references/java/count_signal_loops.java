    Set<String> nodes = new TreeSet<>(adj.keySet());
    adj.values().forEach(nodes::addAll);
    Map<String, Set<String>> reach = new HashMap<>();
    for (String node : nodes) {
        Set<String> seen = new HashSet<>();
        Deque<String> stack = new ArrayDeque<>(List.of(node));
        while (!stack.isEmpty()) {
            for (String next : adj.getOrDefault(stack.pop(), List.of())) {
                if (seen.add(next)) {
                    stack.push(next);
                }
            }
        }
        reach.put(node, seen);
    }
    Set<String> assigned = new HashSet<>();
    long loops = 0;
    for (String node : nodes) {
        if (assigned.contains(node) || !reach.get(node).contains(node)) {
            continue;
        }
        for (String other : reach.get(node)) {
            if (reach.get(other).contains(node)) {
                assigned.add(other);
            }
        }
        loops++;
    }
    return loops;
}
