    StringBuilder out = new StringBuilder();
    boolean pending = false;
    for (int i = 0; i < text.length(); i++) {
        char c = text.charAt(i);
        if (c == ' ' || c == '\t' || c == '\n') {
            pending = true;
        } else {
            if (pending && out.length() > 0) {
                out.append(' ');
            }
            pending = false;
            out.append(c);
        }
    }
    return out.toString();
}
