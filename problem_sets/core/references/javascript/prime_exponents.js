// n <= 10^12 is exact as a Number, and trial division stays below 10^6.
let m = Number(n);
const factors = new Map();
const add = (prime) => factors.set(String(prime), (factors.get(String(prime)) ?? 0n) + 1n);
for (let d = 2; d * d <= m; d += d === 2 ? 1 : 2) {
  while (m % d === 0) {
    add(d);
    m /= d;
  }
}
if (m > 1) add(m);
return Object.fromEntries(factors);
}
