let total: f64 = values
    .iter()
    .zip(&weights)
    .map(|(value, weight)| value * weight)
    .sum();
let total_weight: f64 = weights.iter().sum();
if total_weight == 0.0 {
    None
} else {
    Some(total / total_weight)
}
}
