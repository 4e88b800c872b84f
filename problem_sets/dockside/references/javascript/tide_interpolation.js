const buf = require("fs").readFileSync(0);
let pos = 0;
function nextInt() {
  while (buf[pos] <= 32) pos++;
  let neg = false;
  if (buf[pos] === 45) {
    neg = true;
    pos++;
  }
  let r = 0;
  while (pos < buf.length && buf[pos] > 32) r = r * 10 + (buf[pos++] - 48);
  return neg ? -r : r;
}
const n = nextInt();
const t = new Float64Array(n);
const h = new Float64Array(n);
for (let i = 0; i < n; i++) {
  t[i] = nextInt();
  h[i] = nextInt();
}
const q = nextInt();
const out = [];
for (let k = 0; k < q; k++) {
  const x = nextInt();
  let lo = 0;
  let hi = n - 1; // last i with t[i] <= x
  while (lo < hi) {
    const mid = (lo + hi + 1) >> 1;
    if (t[mid] <= x) lo = mid;
    else hi = mid - 1;
  }
  const i = lo;
  const height = i === n - 1 ? h[i] : h[i] + ((h[i + 1] - h[i]) * (x - t[i])) / (t[i + 1] - t[i]);
  out.push(height.toFixed(9));
}
process.stdout.write(out.join("\n") + "\n");
