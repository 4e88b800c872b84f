// Trial division; n <= 10^12, so divisors stay below 10^6.
let rest = n;
const exponents = new Map<string, bigint>();
const add = (prime: bigint): void => {
  const key = prime.toString();
  exponents.set(key, (exponents.get(key) ?? 0n) + 1n);
};
for (let d = 2n; d * d <= rest; d += d === 2n ? 1n : 2n) {
  while (rest % d === 0n) {
    add(d);
    rest /= d;
  }
}
if (rest > 1n) add(rest);
return Object.fromEntries(exponents);
}
