if (a.length === 0) return [];
const columns = b[0].length;
return a.map((row) =>
  Array.from({ length: columns }, (_, j) => row.reduce((total, value, t) => total + value * b[t][j], 0n)),
);
}
