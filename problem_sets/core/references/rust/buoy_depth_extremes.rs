let low = *values.iter().min()?;
let high = *values.iter().max()?;
Some((low, high))
}
