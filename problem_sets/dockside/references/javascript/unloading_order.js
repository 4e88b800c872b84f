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
const ruleA = new Int32Array(m);
const ruleB = new Int32Array(m);
const start = new Int32Array(n + 2);
const waitingOn = new Int32Array(n + 1); // rules still blocking each crate
for (let i = 0; i < m; i++) {
  ruleA[i] = nextInt();
  ruleB[i] = nextInt();
  start[ruleA[i] + 1]++;
  waitingOn[ruleB[i]]++;
}
for (let c = 1; c <= n + 1; c++) start[c] += start[c - 1];
const fill = Int32Array.from(start);
const after = new Int32Array(m);
for (let i = 0; i < m; i++) after[fill[ruleA[i]]++] = ruleB[i];
const order = new Int32Array(n); // doubles as the queue of crates ready to go
let size = 0;
for (let c = 1; c <= n; c++) if (waitingOn[c] === 0) order[size++] = c;
for (let head = 0; head < size; head++) {
  const c = order[head];
  for (let e = start[c]; e < start[c + 1]; e++) if (--waitingOn[after[e]] === 0) order[size++] = after[e];
}
process.stdout.write(size === n ? order.join(" ") + "\n" : "STUCK\n");
