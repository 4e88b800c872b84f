    List<String> lines = new ArrayList<>();
    StringBuilder line = new StringBuilder();
    long lineLength = 0;
    for (String word : words) {
        long length = word.codePointCount(0, word.length());
        if (line.length() > 0 && lineLength + 1 + length <= width) {
            line.append(' ').append(word);
            lineLength += 1 + length;
        } else {
            if (line.length() > 0) {
                lines.add(line.toString());
            }
            line = new StringBuilder(word);
            lineLength = length;
        }
    }
    if (line.length() > 0) {
        lines.add(line.toString());
    }
    return lines;
}
