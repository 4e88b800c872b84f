const limit = Number(width);
const length = (text: string): number => [...text].length;
const lines: string[] = [];
let current = "";
let currentLength = 0;
for (const word of words) {
  const wordLength = length(word);
  if (current !== "" && currentLength + 1 + wordLength <= limit) {
    current += " " + word;
    currentLength += 1 + wordLength;
  } else {
    if (current !== "") lines.push(current);
    current = word;
    currentLength = wordLength;
  }
}
if (current !== "") lines.push(current);
return lines;
}
