    Map<String, Long> combined = new HashMap<>(a);
    b.forEach((ship, count) -> combined.merge(ship, count, Long::sum));
    return combined;
}
