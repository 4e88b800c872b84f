full_name
    .split(' ')
    .filter_map(|word| word.chars().next())
    .map(|first| first.to_ascii_uppercase())
    .collect()
}
