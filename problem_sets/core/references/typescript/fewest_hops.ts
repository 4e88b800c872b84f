if (start === goal) return 0n;
// Breadth-first search: docks are reached in order of their number of trips.
const hops = new Map<string, bigint>([[start, 0n]]);
const queue = [start];
for (let head = 0; head < queue.length; head++) {
  const dock = queue[head];
  const trips = hops.get(dock)! + 1n;
  for (const next of Object.hasOwn(adj, dock) ? adj[dock] : []) {
    if (hops.has(next)) continue;
    if (next === goal) return trips;
    hops.set(next, trips);
    queue.push(next);
  }
}
return null;
}
