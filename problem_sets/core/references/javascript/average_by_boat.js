const sums = new Map();
const counts = new Map();
for (const [boat, weight] of catches) {
  sums.set(boat, (sums.get(boat) ?? 0) + weight);
  counts.set(boat, (counts.get(boat) ?? 0) + 1);
}
return Object.fromEntries([...sums].map(([boat, sum]) => [boat, sum / counts.get(boat)]));
}
