    List<Long> row = new ArrayList<>(List.of(1L));
    for (int i = 0; i < n; i++) {
        List<Long> next = new ArrayList<>();
        next.add(1L);
        for (int k = 0; k + 1 < row.size(); k++) {
            next.add(row.get(k) + row.get(k + 1));
        }
        next.add(1L);
        row = next;
    }
    return row;
}
