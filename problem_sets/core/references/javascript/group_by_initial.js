const groups = new Map();
for (const word of words) {
  if (word === "") continue;
  const initial = String.fromCodePoint(word.codePointAt(0));
  if (!groups.has(initial)) groups.set(initial, []);
  groups.get(initial).push(word);
}
return Object.fromEntries(groups);
}
