let total = 0.0;
let totalWeight = 0.0;
values.forEach((value, i) => {
  total += value * weights[i];
  totalWeight += weights[i];
});
return totalWeight === 0 ? null : total / totalWeight;
}
