// BigInt keeps the shoelace sum exact: its terms reach 2e12 and the running sum can pass 2^53.
const nums = require("fs").readFileSync(0, "utf8").split(/\s+/).filter((t) => t.length > 0).map(BigInt);
const n = Number(nums[0]);
let twice = 0n;
for (let i = 0; i < n; i++) {
  const j = (i + 1) % n;
  twice += nums[1 + 2 * i] * nums[2 + 2 * j] - nums[1 + 2 * j] * nums[2 + 2 * i];
}
if (twice < 0n) twice = -twice;
process.stdout.write(twice % 2n === 1n ? `${twice / 2n}.5\n` : `${twice / 2n}\n`);
