let smallest = *values.iter().min()?;
let largest = *values.iter().max()?;
Some((smallest, largest))
}
