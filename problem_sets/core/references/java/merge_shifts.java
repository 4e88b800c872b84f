    List<Pair<Long, Long>> sorted = new ArrayList<>(shifts);
    sorted.sort(Comparator.comparing((Pair<Long, Long> shift) -> shift.first()));
    List<Pair<Long, Long>> merged = new ArrayList<>();
    for (Pair<Long, Long> shift : sorted) {
        if (!merged.isEmpty() && shift.first() <= merged.get(merged.size() - 1).second() + 1) {
            Pair<Long, Long> last = merged.remove(merged.size() - 1);
            merged.add(new Pair<>(last.first(), Math.max(last.second(), shift.second())));
        } else {
            merged.add(shift);
        }
    }
    return merged;
}
