words
    .into_iter()
    .map(|word| {
        let length = word.chars().count() as i64;
        (word, length)
    })
    .collect()
}
