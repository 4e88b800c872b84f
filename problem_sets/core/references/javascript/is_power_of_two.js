return n > 0n && (n & (n - 1n)) === 0n;
}
