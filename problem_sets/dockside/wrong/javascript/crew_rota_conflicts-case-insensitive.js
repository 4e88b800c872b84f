// Wrong on purpose: orders the two names ignoring letter case (localeCompare), so "abe" comes
// before "Zed" where ASCII order puts "Zed" first; the line is then not the expected one.
const tokens = require("fs").readFileSync(0, "utf8").split(/\s+/).filter((t) => t.length > 0);
const n = Number(tokens[0]);
const out = [];
for (let i = 0; i < n; i++)
  for (let j = i + 1; j < n; j++) {
    const a = tokens[1 + 3 * i];
    const b = tokens[1 + 3 * j];
    const s1 = Number(tokens[2 + 3 * i]);
    const e1 = Number(tokens[3 + 3 * i]);
    const s2 = Number(tokens[2 + 3 * j]);
    const e2 = Number(tokens[3 + 3 * j]);
    if (Math.max(s1, s2) < Math.min(e1, e2)) out.push(a.localeCompare(b, "en", { sensitivity: "base" }) < 0 ? `${a} ${b}` : `${b} ${a}`);
  }
process.stdout.write(out.length ? out.join("\n") + "\n" : "NONE\n");
