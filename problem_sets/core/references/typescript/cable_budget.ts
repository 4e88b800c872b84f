// Kruskal's algorithm: cheapest cables first, skipping any that close a cycle.
const parent = new Map<string, string>(docks.map((dock) => [dock, dock]));
const find = (dock: string): string => {
  let root = dock;
  while (parent.get(root) !== root) root = parent.get(root)!;
  while (dock !== root) {
    const next = parent.get(dock)!;
    parent.set(dock, root);
    dock = next;
  }
  return root;
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
