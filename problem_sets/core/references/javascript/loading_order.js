// Names are ordered by code point, which the default string order (UTF-16 units) is not.
const byCodePoint = (x, y) => {
  const p = [...x];
  const q = [...y];
  for (let i = 0; i < p.length && i < q.length; i++) {
    const d = p[i].codePointAt(0) - q[i].codePointAt(0);
    if (d !== 0) return d;
  }
  return p.length - q.length;
};
const needs = new Map();
const users = new Map();
const note = (item) => {
  if (!needs.has(item)) {
    needs.set(item, new Set());
    users.set(item, new Set());
  }
};
for (const [item, before] of Object.entries(deps)) {
  note(item);
  for (const other of before) {
    note(other);
    needs.get(item).add(other);
    users.get(other).add(item);
  }
}
const remaining = new Map([...needs].map(([item, prereqs]) => [item, prereqs.size]));
const ready = [...remaining].filter(([, count]) => count === 0).map(([item]) => item);
const order = [];
while (ready.length > 0) {
  ready.sort(byCodePoint);
  const item = ready.shift();
  order.push(item);
  for (const user of users.get(item)) {
    remaining.set(user, remaining.get(user) - 1);
    if (remaining.get(user) === 0) ready.push(user);
  }
}
return order.length === needs.size ? order : null;
}
