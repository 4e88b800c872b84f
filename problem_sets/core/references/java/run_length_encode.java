    int[] chars = text.codePoints().toArray();
    StringBuilder out = new StringBuilder();
    for (int i = 0; i < chars.length; ) {
        int j = i;
        while (j < chars.length && chars[j] == chars[i]) {
            j++;
        }
        out.append(j - i).appendCodePoint(chars[i]);
        i = j;
    }
    return out.toString();
}
