const groups = new Map<string, string[]>();
for (const word of words) {
  if (word === "") continue;
  const initial = String.fromCodePoint(word.codePointAt(0)!);
  const group = groups.get(initial);
  if (group === undefined) groups.set(initial, [word]);
  else group.push(word);
}
return Object.fromEntries(groups);
}
