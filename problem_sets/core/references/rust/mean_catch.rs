if weights.is_empty() {
    return None;
}
Some(weights.iter().sum::<f64>() / weights.len() as f64)
}
