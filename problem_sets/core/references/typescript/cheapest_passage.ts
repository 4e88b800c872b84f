if (start === goal) return 0n;
const graph = new Map<string, [string, bigint][]>();
const link = (from: string, to: string, cost: bigint): void => {
  let list = graph.get(from);
  if (list === undefined) {
    list = [];
    graph.set(from, list);
  }
  list.push([to, cost]);
};
for (const [a, b, cost] of routes) {
  link(a, b, cost);
  link(b, a, cost);
}
// Dijkstra's algorithm, picking the nearest unsettled island by a scan.
const best = new Map<string, bigint>([[start, 0n]]);
const settled = new Set<string>();
for (;;) {
  let island: string | null = null;
  let islandDist = 0n;
  for (const [name, dist] of best) {
    if (!settled.has(name) && (island === null || dist < islandDist)) {
      island = name;
      islandDist = dist;
    }
  }
  if (island === null) return null;
  if (island === goal) return islandDist;
  settled.add(island);
  for (const [next, cost] of graph.get(island) ?? []) {
    const dist = islandDist + cost;
    const known = best.get(next);
    if (known === undefined || dist < known) best.set(next, dist);
  }
}
}
