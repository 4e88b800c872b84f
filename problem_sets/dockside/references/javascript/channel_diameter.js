// Route lengths stay below 2e11, exact as Numbers.
const buf = require("fs").readFileSync(0);
let pos = 0;
function nextInt() {
  while (buf[pos] <= 32) pos++;
  let r = 0;
  while (pos < buf.length && buf[pos] > 32) r = r * 10 + (buf[pos++] - 48);
  return r;
}
const n = nextInt();
const a = new Int32Array(n);
const b = new Int32Array(n);
const c = new Float64Array(n);
const start = new Int32Array(n + 2);
for (let i = 0; i < n - 1; i++) {
  a[i] = nextInt();
  b[i] = nextInt();
  c[i] = nextInt();
  start[a[i] + 1]++;
  start[b[i] + 1]++;
}
for (let v = 1; v <= n + 1; v++) start[v] += start[v - 1];
const fill = Int32Array.from(start);
const other = new Int32Array(2 * n);
const length = new Float64Array(2 * n);
for (let i = 0; i < n - 1; i++) {
  other[fill[a[i]]] = b[i];
  length[fill[a[i]]++] = c[i];
  other[fill[b[i]]] = a[i];
  length[fill[b[i]]++] = c[i];
}
// Distances from source to every islet, by an explicit-stack walk.
function distances(source) {
  const dist = new Float64Array(n + 1).fill(-1);
  const stack = new Int32Array(n);
  let top = 0;
  stack[top++] = source;
  dist[source] = 0;
  while (top > 0) {
    const u = stack[--top];
    for (let e = start[u]; e < start[u + 1]; e++)
      if (dist[other[e]] < 0) {
        dist[other[e]] = dist[u] + length[e];
        stack[top++] = other[e];
      }
  }
  return dist;
}
function argmax(dist) {
  let best = 1;
  for (let v = 2; v <= n; v++) if (dist[v] > dist[best]) best = v;
  return best;
}
// The islet farthest from any islet is an end of a longest route.
const end = argmax(distances(1));
const dist = distances(end);
process.stdout.write(`${dist[argmax(dist)]}\n`);
