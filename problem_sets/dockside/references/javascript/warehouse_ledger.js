// Stocks stay below 1e14, exact as Numbers.
const lines = require("fs").readFileSync(0, "utf8").split("\n");
const q = Number(lines[0]);
const stock = new Map();
const out = [];
for (let i = 1; i <= q; i++) {
  const [command, item, amount] = lines[i].trim().split(/\s+/);
  const have = stock.get(item) || 0;
  if (command === "IN") {
    stock.set(item, have + Number(amount));
  } else if (command === "OUT") {
    const k = Number(amount);
    if (have >= k) stock.set(item, have - k);
    else out.push(`SHORT ${item} ${have}`);
  } else {
    out.push(`${item} ${have}`);
  }
}
out.push("END");
const names = [...stock.keys()].sort(); // default sort compares UTF-16 code units: ASCII order here
for (const name of names) if (stock.get(name) > 0) out.push(`${name} ${stock.get(name)}`);
process.stdout.write(out.join("\n") + "\n");
