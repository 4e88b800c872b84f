let top = *values.iter().max()?;
values.into_iter().filter(|&value| value < top).max()
}
