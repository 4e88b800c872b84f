return values.reduce((sum, value) => sum + value, 0n);
}
