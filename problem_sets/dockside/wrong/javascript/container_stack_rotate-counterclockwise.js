// Wrong on purpose: a quarter turn the other way (counter-clockwise).
const nums = require("fs").readFileSync(0, "utf8").split(/\s+/).filter((t) => t.length > 0).map(Number);
const [r, c] = nums;
const rows = [];
for (let j = c - 1; j >= 0; j--) {
  const row = [];
  for (let i = 0; i < r; i++) row.push(nums[2 + i * c + j]);
  rows.push(row.join(" "));
}
process.stdout.write(rows.join("\n") + "\n");
