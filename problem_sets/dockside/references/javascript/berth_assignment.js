const buf = require("fs").readFileSync(0);
let pos = 0;
function nextInt() {
  while (buf[pos] <= 32) pos++;
  let r = 0;
  while (pos < buf.length && buf[pos] > 32) r = r * 10 + (buf[pos++] - 48);
  return r;
}
const n = nextInt();
const arrive = new Float64Array(n);
const leave = new Float64Array(n);
for (let i = 0; i < n; i++) {
  arrive[i] = nextInt();
  leave[i] = nextInt();
}
const order = Array.from({ length: n }, (_, i) => i).sort((x, y) => arrive[x] - arrive[y]);
// A binary min-heap of berths keyed by the time they free.
const heapT = [];
const heapB = [];
function push(t, b) {
  let i = heapT.length;
  heapT.push(t);
  heapB.push(b);
  while (i > 0) {
    const p = (i - 1) >> 1;
    if (heapT[p] <= t) break;
    heapT[i] = heapT[p];
    heapB[i] = heapB[p];
    i = p;
  }
  heapT[i] = t;
  heapB[i] = b;
}
function pop() {
  const t = heapT.pop();
  const b = heapB.pop();
  if (heapT.length === 0) return;
  const size = heapT.length;
  let i = 0;
  while (true) {
    let c = 2 * i + 1;
    if (c >= size) break;
    if (c + 1 < size && heapT[c + 1] < heapT[c]) c++;
    if (heapT[c] >= t) break;
    heapT[i] = heapT[c];
    heapB[i] = heapB[c];
    i = c;
  }
  heapT[i] = t;
  heapB[i] = b;
}
const berth = new Int32Array(n);
let count = 0;
for (const i of order) {
  let b;
  if (heapT.length > 0 && heapT[0] <= arrive[i]) {
    b = heapB[0]; // the berth freed earliest is free again
    pop();
  } else {
    b = ++count;
  }
  berth[i] = b;
  push(leave[i], b);
}
process.stdout.write(`${count}\n${berth.join(" ")}\n`);
