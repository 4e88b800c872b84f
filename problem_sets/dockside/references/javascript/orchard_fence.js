// Cross products stay below 8e14 in size, so Numbers compute them exactly.
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
let pts = [];
for (let i = 0; i < n; i++) pts.push([nextInt(), nextInt()]);
pts.sort((a, b) => a[0] - b[0] || a[1] - b[1]);
pts = pts.filter((p, i) => i === 0 || p[0] !== pts[i - 1][0] || p[1] !== pts[i - 1][1]);
const cross = (o, a, b) => (a[0] - o[0]) * (b[1] - o[1]) - (a[1] - o[1]) * (b[0] - o[0]);
let length = 0;
if (pts.length > 1) {
  // Andrew's monotone chain: lower hull left to right, then upper hull right to left.
  const hull = [];
  for (const sweep of [pts, pts.slice().reverse()]) {
    const start = hull.length;
    for (const p of sweep) {
      while (hull.length >= start + 2 && cross(hull[hull.length - 2], hull[hull.length - 1], p) <= 0) hull.pop();
      hull.push(p);
    }
    hull.pop(); // the last point starts the other half
  }
  for (let i = 0; i < hull.length; i++) {
    const a = hull[i];
    const b = hull[(i + 1) % hull.length];
    length += Math.hypot(a[0] - b[0], a[1] - b[1]);
  }
}
process.stdout.write(`${length.toFixed(9)}\n`);
