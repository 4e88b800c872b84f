// A Map keeps names such as "__proto__" as ordinary keys; fromEntries makes own properties.
const totals = new Map<string, { sum: number; count: number }>();
for (const [boat, weight] of catches) {
  const entry = totals.get(boat) ?? { sum: 0, count: 0 };
  entry.sum += weight;
  entry.count += 1;
  totals.set(boat, entry);
}
return Object.fromEntries([...totals].map(([boat, { sum, count }]) => [boat, sum / count]));
}
