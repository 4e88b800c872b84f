const tokens = require("fs").readFileSync(0, "utf8").split(/\s+/).filter((t) => t.length > 0);
const t = Number(tokens[0]);
const two = (v) => String(v).padStart(2, "0");
const out = [];
for (let k = 0; k < t; k++) {
  const clock = tokens[1 + 2 * k];
  const end = Number(clock.slice(0, 2)) * 60 + Number(clock.slice(3, 5)) + Number(tokens[2 + 2 * k]);
  const days = Math.floor(end / 1440);
  const minute = end % 1440;
  out.push(`${two(Math.floor(minute / 60))}:${two(minute % 60)}` + (days > 0 ? ` +${days}` : ""));
}
process.stdout.write(out.join("\n") + "\n");
