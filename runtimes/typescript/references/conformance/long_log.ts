// Spreading a string iterates code points, so a surrogate pair counts once.
let total = 0n;
for (const mark of marks) total += mark;
return [BigInt([...entries].length), total];
}
