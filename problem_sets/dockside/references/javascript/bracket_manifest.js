const manifest = require("fs").readFileSync(0, "utf8").trim();
const opener = { ")": "(", "]": "[", "}": "{", ">": "<" };
const stack = [];
let result = null;
for (let i = 0; i < manifest.length && result === null; i++) {
  const c = manifest[i];
  if (!(c in opener)) stack.push(c);
  else if (stack.length === 0 || stack[stack.length - 1] !== opener[c]) result = `INVALID ${i + 1}`;
  else stack.pop();
}
if (result === null) result = stack.length === 0 ? "VALID" : `INVALID ${manifest.length + 1}`;
process.stdout.write(result + "\n");
