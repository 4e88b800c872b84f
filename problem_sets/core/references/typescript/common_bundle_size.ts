let g = 0n;
for (const count of counts) {
  let a = g;
  let b = count < 0n ? -count : count;
  while (b !== 0n) [a, b] = [b, a % b];
  g = a;
}
return g;
}
