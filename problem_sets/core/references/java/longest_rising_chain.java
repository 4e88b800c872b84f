    List<Long> tails = new ArrayList<>();
    for (long value : values) {
        int low = 0;
        int high = tails.size();
        while (low < high) {
            int mid = (low + high) / 2;
            if (tails.get(mid) < value) {
                low = mid + 1;
            } else {
                high = mid;
            }
        }
        if (low == tails.size()) {
            tails.add(value);
        } else {
            tails.set(low, value);
        }
    }
    return tails.size();
}
