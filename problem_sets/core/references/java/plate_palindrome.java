    StringBuilder kept = new StringBuilder();
    for (char c : plate.toCharArray()) {
        if (c >= 'A' && c <= 'Z' || c >= '0' && c <= '9') {
            kept.append(c);
        } else if (c >= 'a' && c <= 'z') {
            kept.append((char) (c - 'a' + 'A'));
        }
    }
    String forward = kept.toString();
    return forward.equals(kept.reverse().toString());
}
