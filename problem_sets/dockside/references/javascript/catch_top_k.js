const nums = require("fs").readFileSync(0, "utf8").split(/\s+/).filter((t) => t.length > 0).map(Number);
const [n, k] = nums;
const w = Float64Array.from(nums.slice(2, 2 + n)).sort().reverse();
process.stdout.write(Array.from(w.subarray(0, k)).join(" ") + "\n");
