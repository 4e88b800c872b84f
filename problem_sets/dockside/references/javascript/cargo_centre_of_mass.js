// The weighted sums stay below 2^53 (at most 100000 * 1000000 * 10000 = 1e15), so Numbers are exact.
const nums = require("fs").readFileSync(0, "utf8").split(/\s+/).filter((t) => t.length > 0).map(Number);
const n = nums[0];
let sx = 0;
let sy = 0;
let total = 0;
for (let i = 0; i < n; i++) {
  const [x, y, w] = nums.slice(1 + 3 * i, 4 + 3 * i);
  sx += w * x;
  sy += w * y;
  total += w;
}
process.stdout.write(`${(sx / total).toFixed(9)} ${(sy / total).toFixed(9)}\n`);
