let mut row = vec![1i64];
for _ in 0..n {
    let mut next = Vec::with_capacity(row.len() + 1);
    next.push(1);
    next.extend(row.windows(2).map(|pair| pair[0] + pair[1]));
    next.push(1);
    row = next;
}
row
}
