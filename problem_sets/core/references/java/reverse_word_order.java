    List<String> words = new ArrayList<>();
    for (String word : line.split(" ")) {
        if (!word.isEmpty()) {
            words.add(word);
        }
    }
    Collections.reverse(words);
    return String.join(" ", words);
}
