    long count = 0;
    for (String name : names) {
        if (name.codePointCount(0, name.length()) >= minLength) {
            count++;
        }
    }
    return count;
}
