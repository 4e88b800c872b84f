    Set<String> seen = new HashSet<>(List.of(start));
    Deque<String> stack = new ArrayDeque<>(List.of(start));
    while (!stack.isEmpty()) {
        for (String next : adj.getOrDefault(stack.pop(), List.of())) {
            if (seen.add(next)) {
                stack.push(next);
            }
        }
    }
    List<String> docks = new ArrayList<>(seen);
    docks.sort((x, y) -> Arrays.compare(x.codePoints().toArray(), y.codePoints().toArray()));
    return docks;
}
