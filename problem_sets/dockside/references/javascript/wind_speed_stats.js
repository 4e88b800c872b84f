const tokens = require("fs").readFileSync(0, "utf8").split(/\s+/).filter((t) => t.length > 0);
const n = Number(tokens[0]);
const x = tokens.slice(1, 1 + n).map(Number);
const mean = x.reduce((a, b) => a + b, 0) / n;
const sq = x.reduce((a, v) => a + (v - mean) * (v - mean), 0);
process.stdout.write(`${mean.toFixed(9)} ${Math.sqrt(sq / n).toFixed(9)}\n`);
