    Set<String> seen = new HashSet<>();
    for (String ticket : tickets) {
        if (!seen.add(ticket)) {
            return ticket;
        }
    }
    return null;
}
