const trim = (part: string): string => part.replace(/^[ \t]+|[ \t]+$/g, "");
// A Map keeps "__proto__" an ordinary key; fromEntries makes own properties.
const totals = new Map<string, bigint>();
for (const line of text.split("\n")) {
  if (trim(line) === "") continue;
  const colon = line.indexOf(":");
  const name = trim(line.slice(0, colon));
  const quantity = BigInt(trim(line.slice(colon + 1)));
  totals.set(name, (totals.get(name) ?? 0n) + quantity);
}
return Object.fromEntries(totals);
}
