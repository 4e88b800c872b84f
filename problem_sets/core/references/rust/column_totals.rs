let mut totals: Vec<i64> = Vec::new();
for row in &grid {
    if row.len() > totals.len() {
        totals.resize(row.len(), 0);
    }
    for (total, value) in totals.iter_mut().zip(row) {
        *total += value;
    }
}
totals
}
