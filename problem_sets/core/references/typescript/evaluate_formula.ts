// Recursive descent over BigInts, whose division truncates toward zero as required. A
// division by zero is noted and the rest of the expression still evaluated.
let pos = 0;
let dividedByZero = false;
const peek = (): string | undefined => {
  while (expr[pos] === " ") pos++;
  return expr[pos];
};
const sum = (): bigint => {
  let value = product();
  for (let op = peek(); op === "+" || op === "-"; op = peek()) {
    pos++;
    const right = product();
    value = op === "+" ? value + right : value - right;
  }
  return value;
};
const product = (): bigint => {
  let value = unary();
  for (let op = peek(); op === "*" || op === "/"; op = peek()) {
    pos++;
    const right = unary();
    if (op === "*") {
      value *= right;
    } else if (right === 0n) {
      dividedByZero = true;
      value = 0n;
    } else {
      value /= right;
    }
  }
  return value;
};
const unary = (): bigint => {
  if (peek() === "-") {
    pos++;
    return -unary();
  }
  return atom();
};
const atom = (): bigint => {
  if (peek() === "(") {
    pos++;
    const value = sum();
    peek();
    pos++; // the closing parenthesis
    return value;
  }
  const begin = pos;
  while (pos < expr.length && expr[pos] >= "0" && expr[pos] <= "9") pos++;
  return BigInt(expr.slice(begin, pos));
};
const value = sum();
return dividedByZero ? null : value;
}
