const parent = new Map(docks.map((dock) => [dock, dock]));
const find = (x) => {
  while (parent.get(x) !== x) {
    parent.set(x, parent.get(parent.get(x)));
    x = parent.get(x);
  }
  return x;
};
const byCost = [...cables].sort((p, q) => (p[2] < q[2] ? -1 : p[2] > q[2] ? 1 : 0));
let total = 0n;
let joined = 0;
for (const [a, b, cost] of byCost) {
  const ra = find(a);
  const rb = find(b);
  if (ra !== rb) {
    parent.set(ra, rb);
    total += cost;
    joined++;
  }
}
if (docks.length > 1 && joined !== docks.length - 1) return null;
return total;
}
