    Map<String, List<String>> groups = new HashMap<>();
    for (String word : words) {
        if (!word.isEmpty()) {
            String initial = new String(Character.toChars(word.codePointAt(0)));
            groups.computeIfAbsent(initial, key -> new ArrayList<>()).add(word);
        }
    }
    return groups;
}
