const targets = (node: string): string[] => (Object.hasOwn(adj, node) ? adj[node] : []);
const nodes = new Set<string>(Object.keys(adj));
for (const list of Object.values(adj)) for (const node of list) nodes.add(node);
// Everything reachable from each lighthouse along one or more links.
const reach = new Map<string, Set<string>>();
for (const node of nodes) {
  const seen = new Set<string>();
  const stack = [...targets(node)];
  while (stack.length > 0) {
    const next = stack.pop()!;
    if (!seen.has(next)) {
      seen.add(next);
      stack.push(...targets(next));
    }
  }
  reach.set(node, seen);
}
// A lighthouse that reaches itself lies on a loop; its loop is every lighthouse it reaches
// that reaches it back.
const assigned = new Set<string>();
let loops = 0n;
for (const node of nodes) {
  const own = reach.get(node)!;
  if (assigned.has(node) || !own.has(node)) continue;
  for (const other of own) {
    if (reach.get(other)!.has(node)) assigned.add(other);
  }
  loops++;
}
return loops;
}
