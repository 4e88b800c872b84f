// The 64-bit two's complement pattern, read as an unsigned value.
let bits = BigInt.asUintN(64, mask);
let count = 0n;
while (bits !== 0n) {
  bits &= bits - 1n;
  count++;
}
return count;
}
