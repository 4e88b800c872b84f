let row: bigint[] = [1n];
for (let i = 0n; i < n; i++) {
  const next: bigint[] = [1n];
  for (let k = 1; k < row.length; k++) next.push(row[k - 1] + row[k]);
  next.push(1n);
  row = next;
}
return row;
}
