let sum = readings.iter().flatten().sum();
let missing = readings.iter().filter(|reading| reading.is_none()).count() as i64;
(sum, missing)
}
