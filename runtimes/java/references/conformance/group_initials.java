    Map<String, List<String>> groups = new LinkedHashMap<>();
    for (String name : names) {
        if (!name.isEmpty()) {
            String initial = new String(Character.toChars(name.codePointAt(0)));
            groups.computeIfAbsent(initial, key -> new ArrayList<>()).add(name);
        }
    }
    return groups;
}
