// Names are ordered by code point, which the default string order (UTF-16 units) is not.
const byCodePoint = (x: string, y: string): number => {
  const p = [...x];
  const q = [...y];
  for (let i = 0; i < p.length && i < q.length; i++) {
    const d = p[i].codePointAt(0)! - q[i].codePointAt(0)!;
    if (d !== 0) return d;
  }
  return p.length - q.length;
};
// Kahn's algorithm, always loading the smallest ready item.
const needs = new Map<string, Set<string>>();
const users = new Map<string, Set<string>>();
const note = (item: string): void => {
  if (!needs.has(item)) {
    needs.set(item, new Set());
    users.set(item, new Set());
  }
};
for (const [item, before] of Object.entries(deps)) {
  note(item);
  for (const other of before) {
    note(other);
    needs.get(item)!.add(other);
    users.get(other)!.add(item);
  }
}
const waiting = new Map<string, number>([...needs].map(([item, prereqs]) => [item, prereqs.size]));
const ready = [...waiting].filter(([, count]) => count === 0).map(([item]) => item);
const order: string[] = [];
while (ready.length > 0) {
  ready.sort(byCodePoint);
  const item = ready.shift()!;
  order.push(item);
  for (const user of users.get(item)!) {
    const left = waiting.get(user)! - 1;
    waiting.set(user, left);
    if (left === 0) ready.push(user);
  }
}
return order.length === needs.size ? order : null;
}
