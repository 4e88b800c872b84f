    int step = (int) Math.floorMod(shift, 26L);
    StringBuilder out = new StringBuilder();
    for (char c : text.toCharArray()) {
        if (c >= 'a' && c <= 'z') {
            out.append((char) ('a' + (c - 'a' + step) % 26));
        } else if (c >= 'A' && c <= 'Z') {
            out.append((char) ('A' + (c - 'A' + step) % 26));
        } else {
            out.append(c);
        }
    }
    return out.toString();
}
