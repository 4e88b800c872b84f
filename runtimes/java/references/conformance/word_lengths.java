    Map<String, Long> lengths = new HashMap<>();
    for (String word : words) {
        lengths.put(word, (long) word.codePointCount(0, word.length()));
    }
    return lengths;
}
