// Wrong on purpose: reuses a berth only when its ship left strictly before the new arrival, so
// a ship arriving at the very time another leaves gets a new berth and k is too large.
const nums = require("fs").readFileSync(0, "utf8").split(/\s+/).filter((t) => t.length > 0).map(Number);
const n = nums[0];
const order = Array.from({ length: n }, (_, i) => i).sort((x, y) => nums[1 + 2 * x] - nums[1 + 2 * y]);
const freeAt = [];
const berth = new Array(n);
for (const i of order) {
  let b = freeAt.findIndex((t) => t < nums[1 + 2 * i]);
  if (b < 0) {
    freeAt.push(0);
    b = freeAt.length - 1;
  }
  freeAt[b] = nums[2 + 2 * i];
  berth[i] = b + 1;
}
process.stdout.write(`${freeAt.length}\n${berth.join(" ")}\n`);
