    int[] p = pattern.codePoints().toArray();
    int[] s = text.codePoints().toArray();
    boolean[][] match = new boolean[p.length + 1][s.length + 1];
    match[0][0] = true;
    for (int i = 1; i <= p.length; i++) {
        match[i][0] = match[i - 1][0] && p[i - 1] == '*';
        for (int j = 1; j <= s.length; j++) {
            if (p[i - 1] == '*') {
                match[i][j] = match[i - 1][j] || match[i][j - 1];
            } else {
                match[i][j] = match[i - 1][j - 1] && (p[i - 1] == '?' || p[i - 1] == s[j - 1]);
            }
        }
    }
    return match[p.length][s.length];
}
