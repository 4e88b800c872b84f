const merged = new Map(Object.entries(a));
for (const [ship, count] of Object.entries(b)) {
  merged.set(ship, (merged.get(ship) ?? 0n) + count);
}
return Object.fromEntries(merged);
}
