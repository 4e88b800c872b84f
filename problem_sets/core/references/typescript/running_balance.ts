let balance = 0n;
return deltas.map((delta) => (balance += delta));
}
