const step = Number(((shift % 26n) + 26n) % 26n);
const rotate = (ch, base) => String.fromCharCode(((ch.charCodeAt(0) - base + step) % 26) + base);
return [...text]
  .map((ch) => {
    if (ch >= "a" && ch <= "z") return rotate(ch, 97);
    if (ch >= "A" && ch <= "Z") return rotate(ch, 65);
    return ch;
  })
  .join("");
}
