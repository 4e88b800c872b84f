// Totals stay below 2e14, well inside the range where Numbers are exact integers.
const buf = require("fs").readFileSync(0);
let pos = 0;
function nextInt() {
  while (buf[pos] <= 32) pos++;
  let r = 0;
  while (pos < buf.length && buf[pos] > 32) r = r * 10 + (buf[pos++] - 48);
  return r;
}
const n = nextInt();
const d = nextInt();
const weights = new Float64Array(n);
let low = 0; // the answer lies in [max weight, total weight]
let high = 0;
for (let i = 0; i < n; i++) {
  weights[i] = nextInt();
  low = Math.max(low, weights[i]);
  high += weights[i];
}
function tripsNeeded(capacity) {
  let trips = 1;
  let load = 0;
  for (let i = 0; i < n; i++) {
    if (load + weights[i] > capacity) {
      if (++trips > d) break;
      load = 0;
    }
    load += weights[i];
  }
  return trips;
}
while (low < high) {
  const mid = Math.floor((low + high) / 2);
  if (tripsNeeded(mid) <= d) high = mid;
  else low = mid + 1;
}
process.stdout.write(`${low}\n`);
