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
const k = nextInt();
const change = new Int32Array(n + 2); // coats added at a segment minus coats ending just before it
for (let j = 0; j < m; j++) {
  change[nextInt()]++;
  change[nextInt() + 1]--;
}
let coats = 0;
let count = 0;
for (let s = 1; s <= n; s++) {
  coats += change[s];
  if (coats >= k) count++;
}
process.stdout.write(`${count}\n`);
