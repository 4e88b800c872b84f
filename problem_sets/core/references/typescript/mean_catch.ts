if (weights.length === 0) return null;
return weights.reduce((sum, weight) => sum + weight, 0) / weights.length;
}
