if a.is_empty() {
    return Vec::new();
}
let columns = b[0].len();
a.iter()
    .map(|row| {
        (0..columns)
            .map(|j| row.iter().zip(&b).map(|(x, b_row)| x * b_row[j]).sum())
            .collect()
    })
    .collect()
}
