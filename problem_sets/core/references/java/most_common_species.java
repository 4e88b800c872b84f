    Map<String, Long> counts = new HashMap<>();
    for (String name : species) {
        counts.merge(name, 1L, Long::sum);
    }
    String best = null;
    for (Map.Entry<String, Long> entry : counts.entrySet()) {
        String name = entry.getKey();
        if (best == null || entry.getValue() > counts.get(best)
                || entry.getValue().equals(counts.get(best))
                && Arrays.compare(name.codePoints().toArray(), best.codePoints().toArray()) < 0) {
            best = name;
        }
    }
    return best;
}
