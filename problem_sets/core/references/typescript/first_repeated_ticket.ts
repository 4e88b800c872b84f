const seen = new Set<string>();
for (const code of tickets) {
  if (seen.has(code)) return code;
  seen.add(code);
}
return null;
}
