names
    .iter()
    .filter(|name| name.chars().count() as i64 >= min_length)
    .count() as i64
}
