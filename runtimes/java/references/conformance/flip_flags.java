    List<Boolean> flipped = new ArrayList<>();
    for (boolean flag : flags) {
        flipped.add(!flag);
    }
    return flipped;
}
