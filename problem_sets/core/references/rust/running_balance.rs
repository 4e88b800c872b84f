deltas
    .iter()
    .scan(0, |balance, delta| {
        *balance += delta;
        Some(*balance)
    })
    .collect()
}
