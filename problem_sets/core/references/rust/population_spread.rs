if values.is_empty() {
    return 0.0;
}
let count = values.len() as f64;
let mean = values.iter().sum::<f64>() / count;
let variance = values
    .iter()
    .map(|value| (value - mean).powi(2))
    .sum::<f64>()
    / count;
variance.sqrt()
}
