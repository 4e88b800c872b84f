const best = [];
for (let i = 0; i < values.length; i++) {
  let length = 1;
  for (let j = 0; j < i; j++) {
    if (values[j] < values[i] && best[j] + 1 > length) length = best[j] + 1;
  }
  best.push(length);
}
return BigInt(Math.max(0, ...best));
}
