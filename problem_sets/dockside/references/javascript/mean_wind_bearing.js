const nums = require("fs").readFileSync(0, "utf8").split(/\s+/).filter((t) => t.length > 0).map(Number);
const n = nums[0];
let east = 0;
let north = 0;
for (let i = 1; i <= n; i++) {
  east += Math.sin((nums[i] * Math.PI) / 180);
  north += Math.cos((nums[i] * Math.PI) / 180);
}
if (Math.hypot(east, north) < 1e-6) {
  process.stdout.write("VARIABLE\n");
} else {
  let bearing = (Math.atan2(east, north) * 180) / Math.PI;
  if (bearing < 0) bearing += 360;
  process.stdout.write(`${bearing.toFixed(9)}\n`);
}
