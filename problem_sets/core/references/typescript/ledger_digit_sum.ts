// BigInt has no overflow, so the most negative value negates safely.
const digits = (n < 0n ? -n : n).toString();
let total = 0n;
for (const digit of digits) total += BigInt(digit);
return total;
}
