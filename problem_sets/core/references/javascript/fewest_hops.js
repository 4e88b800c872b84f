if (start === goal) return 0n;
const dist = new Map([[start, 0n]]);
const queue = [start];
for (let head = 0; head < queue.length; head++) {
  const dock = queue[head];
  for (const next of Object.hasOwn(adj, dock) ? adj[dock] : []) {
    if (dist.has(next)) continue;
    dist.set(next, dist.get(dock) + 1n);
    if (next === goal) return dist.get(next);
    queue.push(next);
  }
}
return null;
}
