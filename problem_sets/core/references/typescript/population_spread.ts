if (values.length === 0) return 0.0;
const mean = values.reduce((sum, value) => sum + value, 0) / values.length;
const variance = values.reduce((sum, value) => sum + (value - mean) ** 2, 0) / values.length;
return Math.sqrt(variance);
}
