// A Map keeps "__proto__" an ordinary key; fromEntries makes own properties.
const merged = new Map<string, bigint>(Object.entries(a));
for (const [ship, count] of Object.entries(b)) {
  merged.set(ship, (merged.get(ship) ?? 0n) + count);
}
return Object.fromEntries(merged);
}
