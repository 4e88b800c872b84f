// Spreading a string yields its code points.
const left = [...a];
const right = [...b];
if (left.length !== right.length) return null;
return BigInt(left.filter((flag, i) => flag !== right[i]).length);
}
