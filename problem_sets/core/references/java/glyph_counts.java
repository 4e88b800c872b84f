    Map<String, Long> counts = new HashMap<>();
    text.codePoints().forEach(c -> counts.merge(new String(Character.toChars(c)), 1L, Long::sum));
    return counts;
}
