const limit = Number(width);
const length = (text) => [...text].length;
const lines = [];
let current = "";
for (const word of words) {
  if (current === "") {
    current = word;
  } else if (length(current) + 1 + length(word) <= limit) {
    current += " " + word;
  } else {
    lines.push(current);
    current = word;
  }
}
if (current !== "") lines.push(current);
return lines;
}
