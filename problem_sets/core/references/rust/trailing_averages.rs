let size = window as usize;
if values.len() < size {
    return Vec::new();
}
values
    .windows(size)
    .map(|readings| readings.iter().sum::<f64>() / size as f64)
    .collect()
}
