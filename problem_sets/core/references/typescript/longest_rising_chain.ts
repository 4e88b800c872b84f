// Patience sorting: tails[k] is the smallest last value of a rising chain of length k + 1.
const tails: bigint[] = [];
for (const value of values) {
  let lo = 0;
  let hi = tails.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (tails[mid] < value) lo = mid + 1;
    else hi = mid;
  }
  tails[lo] = value;
}
return BigInt(tails.length);
}
