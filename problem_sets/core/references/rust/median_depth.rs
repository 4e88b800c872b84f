if depths.is_empty() {
    return None;
}
let mut sorted = depths;
sorted.sort_by(f64::total_cmp);
let mid = sorted.len() / 2;
if sorted.len() % 2 == 1 {
    Some(sorted[mid])
} else {
    Some((sorted[mid - 1] + sorted[mid]) / 2.0)
}
}
