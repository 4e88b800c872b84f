const totals: bigint[] = [];
for (const row of grid) {
  row.forEach((value, j) => {
    totals[j] = (totals[j] ?? 0n) + value;
  });
}
return totals;
}
