const buf = require("fs").readFileSync(0);
let pos = 0;
function nextInt() {
  while (buf[pos] <= 32) pos++;
  let r = 0;
  while (pos < buf.length && buf[pos] > 32) r = r * 10 + (buf[pos++] - 48);
  return r;
}
const n = nextInt();
const tails = new Float64Array(n); // tails[k]: smallest last height of a rising selection of k + 1 trees
let len = 0;
for (let i = 0; i < n; i++) {
  const h = nextInt();
  let lo = 0;
  let hi = len; // first position whose tail is >= h
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (tails[mid] < h) lo = mid + 1;
    else hi = mid;
  }
  tails[lo] = h;
  if (lo === len) len++;
}
process.stdout.write(`${len}\n`);
