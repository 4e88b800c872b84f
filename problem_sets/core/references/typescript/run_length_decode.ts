// Iterating a string yields code points, so the character of a group may be a surrogate pair.
let out = "";
let count = 0;
for (const ch of code) {
  if (ch >= "0" && ch <= "9") {
    count = count * 10 + Number(ch);
  } else {
    out += ch.repeat(count);
    count = 0;
  }
}
return out;
}
