let value = BigInt.asUintN(64, mask);
let count = 0n;
while (value !== 0n) {
  value &= value - 1n;
  count++;
}
return count;
}
