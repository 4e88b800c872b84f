    if (crew.isEmpty()) {
        return new ArrayList<>();
    }
    int r = (int) (k % crew.size());
    List<String> rotated = new ArrayList<>(crew.subList(r, crew.size()));
    rotated.addAll(crew.subList(0, r));
    return rotated;
}
