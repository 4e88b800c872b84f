    Set<Long> free = new HashSet<>();
    for (long berth = 1; berth <= count; berth++) {
        if (!taken.contains(berth)) {
            free.add(berth);
        }
    }
    return free;
}
