    List<Long> gaps = new ArrayList<>();
    for (int i = 0; i + 1 < positions.size(); i++) {
        gaps.add(positions.get(i + 1) - positions.get(i));
    }
    return gaps;
}
