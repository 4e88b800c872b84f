const groups = {};
for (const name of names) {
  if (name === "") continue;
  const initial = String.fromCodePoint(name.codePointAt(0));
  (groups[initial] ??= []).push(name);
}
return groups;
}
