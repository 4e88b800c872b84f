    int i = 0;
    while (i < code.length() && code.charAt(i) >= 'A' && code.charAt(i) <= 'Z') {
        i++;
    }
    int j = i;
    while (j < code.length() && code.charAt(j) >= '0' && code.charAt(j) <= '9') {
        j++;
    }
    if (i == 0 || j == i || j != code.length() || j - i > 18) {
        return null;
    }
    return new Pair<>(code.substring(0, i), Long.parseLong(code.substring(i)));
}
