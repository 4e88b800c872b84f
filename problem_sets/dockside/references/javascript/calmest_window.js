const buf = require("fs").readFileSync(0);
let pos = 0;
function nextInt() {
  while (buf[pos] <= 32) pos++;
  let r = 0;
  while (pos < buf.length && buf[pos] > 32) r = r * 10 + (buf[pos++] - 48);
  return r;
}
const n = nextInt();
const k = nextInt();
const h = new Float64Array(n);
for (let i = 0; i < n; i++) h[i] = nextInt();
const window = new Int32Array(n); // a deque of indices, heights decreasing; window[head] = maximum
let head = 0;
let tail = 0;
let best = -1;
let start = 0;
for (let i = 0; i < n; i++) {
  while (tail > head && h[window[tail - 1]] <= h[i]) tail--;
  window[tail++] = i;
  if (window[head] <= i - k) head++;
  if (i >= k - 1 && (best < 0 || h[window[head]] < best)) {
    best = h[window[head]];
    start = i - k + 2;
  }
}
process.stdout.write(`${best} ${start}\n`);
