if (depths.length === 0) return null;
const ordered = [...depths].sort((x, y) => x - y);
const mid = Math.floor(ordered.length / 2);
return ordered.length % 2 === 1 ? ordered[mid] : (ordered[mid - 1] + ordered[mid]) / 2;
}
