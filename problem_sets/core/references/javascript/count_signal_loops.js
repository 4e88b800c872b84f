const targets = (node) => (Object.hasOwn(adj, node) ? adj[node] : []);
const nodes = new Set(Object.keys(adj));
for (const list of Object.values(adj)) for (const node of list) nodes.add(node);
// Everything reachable from each node in one or more links.
const reach = new Map();
for (const node of nodes) {
  const seen = new Set();
  const stack = [...targets(node)];
  while (stack.length > 0) {
    const next = stack.pop();
    if (!seen.has(next)) {
      seen.add(next);
      stack.push(...targets(next));
    }
  }
  reach.set(node, seen);
}
const assigned = new Set();
let loops = 0n;
for (const node of nodes) {
  if (assigned.has(node) || !reach.get(node).has(node)) continue;
  for (const other of reach.get(node)) {
    if (reach.get(other).has(node)) assigned.add(other);
  }
  loops++;
}
return loops;
}
