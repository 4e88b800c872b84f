if (crew.length === 0) return [];
const r = Number(k % BigInt(crew.length));
return [...crew.slice(r), ...crew.slice(0, r)];
}
