match (readings.iter().min(), readings.iter().max()) {
    (Some(low), Some(high)) => high - low,
    _ => 0,
}
}
