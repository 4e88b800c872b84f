const buf = require("fs").readFileSync(0);
let pos = 0;
function nextInt() {
  while (buf[pos] <= 32) pos++;
  let r = 0;
  while (pos < buf.length && buf[pos] > 32) r = r * 10 + (buf[pos++] - 48);
  return r;
}
const n = nextInt();
const a = new Float64Array(n);
const b = new Float64Array(n);
for (let i = 0; i < n; i++) {
  a[i] = nextInt();
  b[i] = nextInt();
}
a.sort();
b.sort();
let best = 0;
let when = 0;
let current = 0;
let j = 0;
for (const t of a) {
  while (b[j] <= t) {
    // a departure at t frees its mooring first
    current--;
    j++;
  }
  current++;
  if (current > best) {
    best = current;
    when = t;
  }
}
process.stdout.write(`${best} ${when}\n`);
