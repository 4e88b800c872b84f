// Spreading a string yields its code points.
return BigInt(names.filter((name) => BigInt([...name].length) >= minLength).length);
}
