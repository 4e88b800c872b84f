    Set<String> both = new HashSet<>(first);
    both.retainAll(second);
    return both;
}
