const counts = new Map();
for (const ch of text) counts.set(ch, (counts.get(ch) ?? 0n) + 1n);
return Object.fromEntries(counts);
}
