return values.map((value) => {
  if (low !== null && value < low) return low;
  if (high !== null && value > high) return high;
  return value;
});
}
