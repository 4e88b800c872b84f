const step = Number(((shift % 26n) + 26n) % 26n);
const rotate = (ch: string, base: number): string =>
  String.fromCharCode(((ch.charCodeAt(0) - base + step) % 26) + base);
return text.replace(/[a-zA-Z]/g, (ch) => rotate(ch, ch >= "a" ? 97 : 65));
}
