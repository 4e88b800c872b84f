if readings.is_empty() {
    return 0.0;
}
readings.iter().sum::<f64>() / readings.len() as f64
}
