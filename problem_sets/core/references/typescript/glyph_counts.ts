// Iterating a string yields code points; a Map keeps "__proto__" an ordinary key.
const counts = new Map<string, bigint>();
for (const ch of text) counts.set(ch, (counts.get(ch) ?? 0n) + 1n);
return Object.fromEntries(counts);
}
