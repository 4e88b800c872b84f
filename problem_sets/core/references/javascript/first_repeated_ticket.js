const seen = new Set();
for (const code of tickets) {
  if (seen.has(code)) return code;
  seen.add(code);
}
return null;
}
