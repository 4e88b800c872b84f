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
let networks = docks.length;
for (const [a, b] of links) {
  const ra = find(a);
  const rb = find(b);
  if (ra !== rb) {
    parent.set(ra, rb);
    networks--;
  }
}
return BigInt(networks);
}
