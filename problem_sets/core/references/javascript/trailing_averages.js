const size = Number(window);
const out = [];
for (let i = size - 1; i < values.length; i++) {
  let sum = 0;
  for (let j = i - size + 1; j <= i; j++) sum += values[j];
  out.push(sum / size);
}
return out;
}
