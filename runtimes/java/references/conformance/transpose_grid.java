    List<List<Long>> columns = new ArrayList<>();
    if (grid.isEmpty()) {
        return columns;
    }
    for (int i = 0; i < grid.get(0).size(); i++) {
        List<Long> column = new ArrayList<>();
        for (List<Long> row : grid) {
            column.add(row.get(i));
        }
        columns.add(column);
    }
    return columns;
}
