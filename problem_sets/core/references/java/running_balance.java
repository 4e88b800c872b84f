    List<Long> balances = new ArrayList<>();
    long balance = 0;
    for (long delta : deltas) {
        balance += delta;
        balances.add(balance);
    }
    return balances;
}
