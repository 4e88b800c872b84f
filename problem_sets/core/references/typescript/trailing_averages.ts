const size = Number(window);
const means: number[] = [];
for (let i = size - 1; i < values.length; i++) {
  let sum = 0;
  for (let j = i - size + 1; j <= i; j++) sum += values[j];
  means.push(sum / size);
}
return means;
}
