const gcd = (x: bigint, y: bigint): bigint => {
  if (x < 0n) x = -x;
  if (y < 0n) y = -y;
  while (y !== 0n) [x, y] = [y, x % y];
  return x;
};
let num = 0n;
let den = 1n;
for (const [p, q] of fracs) {
  num = num * q + p * den;
  den *= q;
  if (den < 0n) {
    num = -num;
    den = -den;
  }
  const g = gcd(num, den);
  num /= g;
  den /= g;
}
return [num, den];
}
