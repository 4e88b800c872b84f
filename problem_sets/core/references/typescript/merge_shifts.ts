const compare = (x: bigint, y: bigint): number => (x < y ? -1 : x > y ? 1 : 0);
const ordered = [...shifts].sort((p, q) => compare(p[0], q[0]) || compare(p[1], q[1]));
const merged: [bigint, bigint][] = [];
for (const [start, end] of ordered) {
  const last = merged.at(-1);
  if (last !== undefined && start <= last[1] + 1n) {
    if (end > last[1]) last[1] = end;
  } else {
    merged.push([start, end]);
  }
}
return merged;
}
