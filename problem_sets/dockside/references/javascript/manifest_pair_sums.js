// Pair counts stay below 2e10, far inside the range where Numbers are exact integers.
const buf = require("fs").readFileSync(0);
let pos = 0;
function nextInt() {
  while (buf[pos] <= 32) pos++;
  let r = 0;
  while (pos < buf.length && buf[pos] > 32) r = r * 10 + (buf[pos++] - 48);
  return r;
}
const n = nextInt();
const target = nextInt();
const seen = new Map();
let pairs = 0;
for (let i = 0; i < n; i++) {
  const w = nextInt();
  pairs += seen.get(target - w) || 0; // earlier crates that complete this one
  seen.set(w, (seen.get(w) || 0) + 1);
}
process.stdout.write(`${pairs}\n`);
