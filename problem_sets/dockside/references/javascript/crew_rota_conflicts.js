const tokens = require("fs").readFileSync(0, "utf8").split(/\s+/).filter((t) => t.length > 0);
const n = Number(tokens[0]);
const shifts = [];
for (let i = 0; i < n; i++) shifts.push([tokens[1 + 3 * i], Number(tokens[2 + 3 * i]), Number(tokens[3 + 3 * i])]);
const out = [];
for (let i = 0; i < n; i++)
  for (let j = i + 1; j < n; j++) {
    const [a, s1, e1] = shifts[i];
    const [b, s2, e2] = shifts[j];
    // < on strings compares UTF-16 code units: ASCII order for these names
    if (Math.max(s1, s2) < Math.min(e1, e2)) out.push(a < b ? `${a} ${b}` : `${b} ${a}`);
  }
process.stdout.write(out.length ? out.join("\n") + "\n" : "NONE\n");
