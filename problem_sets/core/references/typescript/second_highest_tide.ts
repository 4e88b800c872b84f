let top: bigint | null = null;
let second: bigint | null = null;
for (const value of values) {
  if (top === null || value > top) {
    second = top;
    top = value;
  } else if (value < top && (second === null || value > second)) {
    second = value;
  }
}
return second;
}
