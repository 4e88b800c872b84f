    List<Long> result = new ArrayList<>(Collections.nCopies(heights.size(), -1L));
    Deque<Integer> waiting = new ArrayDeque<>();
    for (int i = 0; i < heights.size(); i++) {
        while (!waiting.isEmpty() && heights.get(waiting.peek()) < heights.get(i)) {
            result.set(waiting.pop(), (long) i);
        }
        waiting.push(i);
    }
    return result;
}
