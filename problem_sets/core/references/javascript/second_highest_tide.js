let top = null;
let second = null;
for (const value of values) {
  if (top === null || value > top) {
    if (top !== null) second = top;
    top = value;
  } else if (value < top && (second === null || value > second)) {
    second = value;
  }
}
return second;
}
