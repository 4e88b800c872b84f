const tokens = require("fs").readFileSync(0, "utf8").split(/\s+/).filter((t) => t.length > 0);
const t = Number(tokens[0]);
const out = [];
for (const label of tokens.slice(1, 1 + t)) {
  if (!/^[0-9]{8}$/.test(label)) {
    out.push("MALFORMED");
    continue;
  }
  let s = 0;
  for (let i = 0; i < 7; i++) s += Number(label[i]) * (i % 2 === 0 ? 3 : 1);
  const d = (10 - (s % 10)) % 10;
  out.push(Number(label[7]) === d ? "OK" : `BAD ${d}`);
}
process.stdout.write(out.join("\n") + "\n");
