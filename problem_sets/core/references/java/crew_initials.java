    if (fullName.isEmpty()) {
        return "";
    }
    StringBuilder out = new StringBuilder();
    for (String word : fullName.split(" ")) {
        int first = word.codePointAt(0);
        if (first >= 'a' && first <= 'z') {
            first -= 'a' - 'A';
        }
        out.appendCodePoint(first);
    }
    return out.toString();
}
