const nums = require("fs").readFileSync(0, "utf8").split(/\s+/).filter((t) => t.length > 0).map(Number);
const [r, c] = nums;
const rows = [];
for (let j = 0; j < c; j++) {
  const row = [];
  for (let i = r - 1; i >= 0; i--) row.push(nums[2 + i * c + j]);
  rows.push(row.join(" "));
}
process.stdout.write(rows.join("\n") + "\n");
