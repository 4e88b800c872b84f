const tokens = require("fs").readFileSync(0, "utf8").split(/\s+/).filter((t) => t.length > 0);
const r = Number(tokens[0]);
const c = Number(tokens[1]);
const grid = tokens.slice(2, 2 + r);
const steps = new Int32Array(r * c).fill(-1);
const queue = new Int32Array(r * c);
let head = 0;
let tail = 0;
for (let i = 0; i < r; i++)
  for (let j = 0; j < c; j++)
    if (grid[i][j] === "S") {
      steps[i * c + j] = 0;
      queue[tail++] = i * c + j;
    }
let answer = -1;
while (head < tail) {
  const cell = queue[head++];
  const i = Math.floor(cell / c);
  const j = cell % c;
  if (grid[i][j] === "T") {
    answer = steps[cell];
    break;
  }
  for (const [ni, nj] of [[i - 1, j], [i + 1, j], [i, j - 1], [i, j + 1]]) {
    if (ni >= 0 && ni < r && nj >= 0 && nj < c && grid[ni][nj] !== "#" && steps[ni * c + nj] < 0) {
      steps[ni * c + nj] = steps[cell] + 1;
      queue[tail++] = ni * c + nj;
    }
  }
}
process.stdout.write(`${answer}\n`);
