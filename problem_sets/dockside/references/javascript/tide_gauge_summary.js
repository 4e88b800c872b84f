const tokens = require("fs").readFileSync(0, "utf8").split(/\s+/).filter((t) => t.length > 0);
const n = Number(tokens[0]);
const h = tokens.slice(1, 1 + n).map(Number);
let lo = h[0];
let hi = h[0];
let rises = 0;
for (let i = 0; i < n; i++) {
  if (h[i] < lo) lo = h[i];
  if (h[i] > hi) hi = h[i];
  if (i > 0 && h[i] > h[i - 1]) rises++;
}
process.stdout.write(`${lo}\n${hi}\n${rises}\n`);
