let capacity = capacity as usize;
// best[room]: the largest worth that fits in `room` tonnes using the crates seen so far.
let mut best = vec![0i64; capacity + 1];
for (&weight, &value) in weights.iter().zip(&values) {
    let weight = weight as usize;
    if weight > capacity {
        continue;
    }
    for room in (weight..=capacity).rev() {
        best[room] = best[room].max(best[room - weight] + value);
    }
}
best[capacity]
}
