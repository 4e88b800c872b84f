const both = new Set();
for (const name of first) {
  if (second.has(name)) both.add(name);
}
return both;
}
