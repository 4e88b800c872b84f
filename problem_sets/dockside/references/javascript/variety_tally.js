const tokens = require("fs").readFileSync(0, "utf8").split(/\s+/).filter((t) => t.length > 0);
const n = Number(tokens[0]);
const totals = new Map();
for (let i = 0; i < n; i++) {
  const name = tokens[1 + 2 * i];
  const entry = totals.get(name) || [0, 0];
  entry[0] += Number(tokens[2 + 2 * i]);
  entry[1] += 1;
  totals.set(name, entry);
}
const out = [];
for (const [name, [total, baskets]] of totals) out.push(`${name} ${total} ${baskets}\n`);
process.stdout.write(out.join(""));
