// Recursive descent over BigInts: BigInt division truncates toward zero, as required, and
// throws a RangeError when dividing by zero.
let pos = 0;
const peek = () => {
  while (expr[pos] === " ") pos++;
  return expr[pos];
};
const sum = () => {
  let value = product();
  for (let op = peek(); op === "+" || op === "-"; op = peek()) {
    pos++;
    const right = product();
    value = op === "+" ? value + right : value - right;
  }
  return value;
};
const product = () => {
  let value = unary();
  for (let op = peek(); op === "*" || op === "/"; op = peek()) {
    pos++;
    const right = unary();
    value = op === "*" ? value * right : value / right;
  }
  return value;
};
const unary = () => {
  if (peek() === "-") {
    pos++;
    return -unary();
  }
  return atom();
};
const atom = () => {
  if (peek() === "(") {
    pos++;
    const value = sum();
    peek();
    pos++;
    return value;
  }
  const begin = pos;
  while (expr[pos] >= "0" && expr[pos] <= "9") pos++;
  return BigInt(expr.slice(begin, pos));
};
try {
  return sum();
} catch (error) {
  if (error instanceof RangeError) return null;
  throw error;
}
}
