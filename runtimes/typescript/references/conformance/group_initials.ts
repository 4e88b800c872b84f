const groups: Record<string, string[]> = {};
for (const name of names) {
  // Iterating a string yields code points, so the first one may be a surrogate pair.
  for (const initial of name) {
    (groups[initial] ??= []).push(name);
    break;
  }
}
return groups;
}
