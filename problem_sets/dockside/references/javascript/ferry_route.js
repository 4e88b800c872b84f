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
const from = new Int32Array(m);
const to = new Int32Array(m);
const time = new Float64Array(m);
const start = new Int32Array(n + 2); // adjacency in compressed rows
for (let i = 0; i < m; i++) {
  from[i] = nextInt();
  to[i] = nextInt();
  time[i] = nextInt();
  start[from[i] + 1]++;
  start[to[i] + 1]++;
}
for (let v = 1; v <= n + 1; v++) start[v] += start[v - 1];
const fill = Int32Array.from(start);
const other = new Int32Array(2 * m);
const weight = new Float64Array(2 * m);
for (let i = 0; i < m; i++) {
  other[fill[from[i]]] = to[i];
  weight[fill[from[i]]++] = time[i];
  other[fill[to[i]]] = from[i];
  weight[fill[to[i]]++] = time[i];
}
// A binary min-heap of (distance, harbour); distances stay below 2^53.
const heapD = [];
const heapV = [];
function push(d, v) {
  let i = heapD.length;
  heapD.push(d);
  heapV.push(v);
  while (i > 0) {
    const p = (i - 1) >> 1;
    if (heapD[p] <= d) break;
    heapD[i] = heapD[p];
    heapV[i] = heapV[p];
    i = p;
  }
  heapD[i] = d;
  heapV[i] = v;
}
function pop() {
  const d = heapD.pop();
  const v = heapV.pop();
  if (heapD.length === 0) return;
  let i = 0;
  const size = heapD.length;
  while (true) {
    let c = 2 * i + 1;
    if (c >= size) break;
    if (c + 1 < size && heapD[c + 1] < heapD[c]) c++;
    if (heapD[c] >= d) break;
    heapD[i] = heapD[c];
    heapV[i] = heapV[c];
    i = c;
  }
  heapD[i] = d;
  heapV[i] = v;
}
const dist = new Float64Array(n + 1).fill(Infinity);
const cameFrom = new Int32Array(n + 1);
dist[1] = 0;
push(0, 1);
while (heapD.length > 0) {
  const d = heapD[0];
  const u = heapV[0];
  pop();
  if (d > dist[u]) continue;
  if (u === n) break;
  for (let e = start[u]; e < start[u + 1]; e++) {
    const v = other[e];
    const nd = d + weight[e];
    if (nd < dist[v]) {
      dist[v] = nd;
      cameFrom[v] = u;
      push(nd, v);
    }
  }
}
if (dist[n] === Infinity) {
  process.stdout.write("-1\n");
} else {
  const route = [n];
  while (route[route.length - 1] !== 1) route.push(cameFrom[route[route.length - 1]]);
  route.reverse();
  process.stdout.write(`${dist[n]}\n${route.join(" ")}\n`);
}
