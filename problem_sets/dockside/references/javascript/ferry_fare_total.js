const nums = require("fs").readFileSync(0, "utf8").split(/\s+/).filter((t) => t.length > 0).map(Number);
const t = nums[0];
const out = [];
for (let k = 0; k < t; k++) {
  const [a, c, s, b] = nums.slice(1 + 4 * k, 5 + 4 * k);
  let pence = 450 * a + 225 * c + 310 * s + 105 * b;
  if (a + c + s >= 10) pence = Math.floor((pence * 9 + 5) / 10);
  out.push(`${Math.floor(pence / 100)}.${String(pence % 100).padStart(2, "0")}`);
}
process.stdout.write(out.join("\n") + "\n");
