    List<Long> totals = new ArrayList<>();
    for (List<Long> row : grid) {
        for (int j = 0; j < row.size(); j++) {
            if (j == totals.size()) {
                totals.add(0L);
            }
            totals.set(j, totals.get(j) + row.get(j));
        }
    }
    return totals;
}
