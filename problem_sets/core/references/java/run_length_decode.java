    StringBuilder out = new StringBuilder();
    int count = 0;
    for (int i = 0; i < code.length(); ) {
        int c = code.codePointAt(i);
        i += Character.charCount(c);
        if (c >= '0' && c <= '9') {
            count = count * 10 + (c - '0');
        } else {
            for (int k = 0; k < count; k++) {
                out.appendCodePoint(c);
            }
            count = 0;
        }
    }
    return out.toString();
}
