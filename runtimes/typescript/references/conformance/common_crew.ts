const both = new Set<string>();
for (const name of first) {
  if (second.has(name)) both.add(name);
}
return both;
}
