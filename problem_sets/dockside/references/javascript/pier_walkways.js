const buf = require("fs").readFileSync(0);
let pos = 0;
function nextInt() {
  while (buf[pos] <= 32) pos++;
  let r = 0;
  while (pos < buf.length && buf[pos] > 32) r = r * 10 + (buf[pos++] - 48);
  return r;
}
const n = nextInt();
const m = nextInt();
const parent = new Int32Array(n + 1).map((_, i) => i);
const size = new Int32Array(n + 1).fill(1);
function find(x) {
  let root = x;
  while (parent[root] !== root) root = parent[root];
  while (parent[x] !== root) {
    // path compression
    const next = parent[x];
    parent[x] = root;
    x = next;
  }
  return root;
}
let groups = n;
let joined = n === 1 ? 0 : -1;
let wasted = 0;
for (let j = 1; j <= m; j++) {
  let a = find(nextInt());
  let b = find(nextInt());
  if (a === b) {
    wasted++;
    continue;
  }
  if (size[a] < size[b]) [a, b] = [b, a];
  parent[b] = a;
  size[a] += size[b];
  if (--groups === 1) joined = j;
}
process.stdout.write(`${joined} ${wasted}\n`);
