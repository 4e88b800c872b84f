const numbers = require("fs").readFileSync(0, "utf8").split(/\s+/).filter(Boolean).map(Number);
const weights = numbers.slice(1, 1 + numbers[0]);
console.log(`${weights.reduce((a, b) => a + b, 0)} ${Math.max(...weights)}`);
