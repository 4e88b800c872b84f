const chars = [...text];
// matches[j]: the pattern read so far matches the first j characters of the text.
let matches: boolean[] = [true, ...new Array<boolean>(chars.length).fill(false)];
for (const p of pattern) {
  const next = new Array<boolean>(chars.length + 1).fill(false);
  if (p === "*") {
    let seen = false;
    for (let j = 0; j <= chars.length; j++) {
      seen = seen || matches[j];
      next[j] = seen;
    }
  } else {
    for (let j = 1; j <= chars.length; j++) {
      next[j] = matches[j - 1] && (p === "?" || p === chars[j - 1]);
    }
  }
  matches = next;
}
return matches[chars.length];
}
