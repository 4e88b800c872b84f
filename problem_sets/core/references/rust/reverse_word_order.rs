line.split(' ')
    .filter(|word| !word.is_empty())
    .rev()
    .collect::<Vec<_>>()
    .join(" ")
}
