readings.into_iter().map(|reading| if reading.is_nan() { fill } else { reading }).collect()
}
