// Squared distances can reach 8e18, past 2^53: as Numbers they are rounded, which moves the
// distance by far less than the 1e-6 relative tolerance.
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
const order = [];
const px = new Float64Array(n);
const py = new Float64Array(n);
for (let i = 0; i < n; i++) {
  px[i] = nextInt();
  py[i] = nextInt();
  order.push(i);
}
order.sort((a, b) => px[a] - px[b]);
const xs = Float64Array.from(order, (i) => px[i]);
const ys = Float64Array.from(order, (i) => py[i]);
const tx = new Float64Array(n);
const ty = new Float64Array(n);

// Smallest squared distance in [lo, hi) (sorted by x); leaves that range sorted by y.
function closest(lo, hi) {
  if (hi - lo <= 3) {
    let best = Infinity;
    for (let i = lo; i < hi; i++)
      for (let j = i + 1; j < hi; j++) {
        const dx = xs[i] - xs[j];
        const dy = ys[i] - ys[j];
        best = Math.min(best, dx * dx + dy * dy);
      }
    for (let i = lo + 1; i < hi; i++)
      for (let j = i; j > lo && ys[j] < ys[j - 1]; j--) {
        let t = xs[j]; xs[j] = xs[j - 1]; xs[j - 1] = t;
        t = ys[j]; ys[j] = ys[j - 1]; ys[j - 1] = t;
      }
    return best;
  }
  const mid = (lo + hi) >> 1;
  const splitX = xs[mid];
  let best = Math.min(closest(lo, mid), closest(mid, hi));
  let a = lo;
  let b = mid;
  let k = 0;
  while (a < mid || b < hi) {
    if (b >= hi || (a < mid && ys[a] <= ys[b])) {
      tx[k] = xs[a]; ty[k++] = ys[a++];
    } else {
      tx[k] = xs[b]; ty[k++] = ys[b++];
    }
  }
  xs.set(tx.subarray(0, k), lo);
  ys.set(ty.subarray(0, k), lo);
  let size = 0;
  for (let i = lo; i < hi; i++) {
    const dx = xs[i] - splitX;
    if (dx * dx < best) {
      tx[size] = xs[i]; ty[size++] = ys[i];
    }
  }
  for (let i = 0; i < size; i++)
    for (let j = i + 1; j < size; j++) {
      const dy = ty[j] - ty[i];
      if (dy * dy >= best) break;
      const dx = tx[j] - tx[i];
      best = Math.min(best, dx * dx + dy * dy);
    }
  return best;
}
process.stdout.write(`${Math.sqrt(closest(0, n)).toFixed(9)}\n`);
