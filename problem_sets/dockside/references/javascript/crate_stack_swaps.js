const buf = require("fs").readFileSync(0);
let pos = 0;
function nextInt() {
  while (buf[pos] <= 32) pos++;
  let r = 0;
  while (pos < buf.length && buf[pos] > 32) r = r * 10 + (buf[pos++] - 48);
  return r;
}
const n = nextInt();
const w = new Float64Array(n);
for (let i = 0; i < n; i++) w[i] = nextInt();
const sorted = Float64Array.from(w).sort();
let size = 0;
for (let i = 0; i < n; i++) if (i === 0 || sorted[i] !== sorted[i - 1]) sorted[size++] = sorted[i];
function rankOf(v) {
  let lo = 0;
  let hi = size - 1;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (sorted[mid] < v) lo = mid + 1;
    else hi = mid;
  }
  return lo + 1;
}
const tree = new Int32Array(size + 1); // Fenwick tree of counts by weight rank
let swaps = 0; // at most n(n-1)/2 < 2^53, exact as a Number
for (let seen = 0; seen < n; seen++) {
  const r = rankOf(w[seen]);
  let notHeavier = 0;
  for (let i = r; i > 0; i &= i - 1) notHeavier += tree[i];
  swaps += seen - notHeavier; // earlier crates heavier than this one
  for (let i = r; i <= size; i += i & -i) tree[i]++;
}
process.stdout.write(`${swaps}\n`);
