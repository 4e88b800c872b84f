const parent = new Map(docks.map((dock) => [dock, dock]));
const find = (x) => {
  while (parent.get(x) !== x) {
    parent.set(x, parent.get(parent.get(x)));
    x = parent.get(x);
  }
  return x;
};
let groups = docks.length;
for (const [a, b] of links) {
  const ra = find(a);
  const rb = find(b);
  if (ra !== rb) {
    parent.set(ra, rb);
    groups--;
  }
}
return BigInt(groups);
}
