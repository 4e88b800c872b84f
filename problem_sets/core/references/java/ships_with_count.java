    List<String> names = new ArrayList<>();
    for (Map.Entry<String, Long> entry : tally.entrySet()) {
        if (entry.getValue() == target) {
            names.add(entry.getKey());
        }
    }
    names.sort((x, y) -> Arrays.compare(x.codePoints().toArray(), y.codePoints().toArray()));
    return names;
}
