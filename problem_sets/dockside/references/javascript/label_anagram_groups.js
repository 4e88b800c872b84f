const tokens = require("fs").readFileSync(0, "utf8").split(/\s+/).filter((t) => t.length > 0);
const n = Number(tokens[0]);
const groups = new Map(); // keyed by the sorted letters
for (const label of tokens.slice(1, 1 + n)) {
  const key = label.split("").sort().join("");
  if (!groups.has(key)) groups.set(key, []);
  groups.get(key).push(label);
}
const lines = [];
for (const labels of groups.values()) if (labels.length >= 2) lines.push(labels.sort().join(" "));
process.stdout.write(lines.length ? lines.join("\n") + "\n" : "NONE\n");
