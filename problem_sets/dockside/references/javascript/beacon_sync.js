// BigInt: the answer can pass 2^53, where a Number stops being exact.
const nums = require("fs").readFileSync(0, "utf8").split(/\s+/).filter((t) => t.length > 0).map(BigInt);
const gcd = (a, b) => (b === 0n ? a : gcd(b, a % b));
const n = Number(nums[0]);
let t = 1n;
for (let i = 1; i <= n; i++) t = (t / gcd(t, nums[i])) * nums[i];
process.stdout.write(`${t}\n`);
