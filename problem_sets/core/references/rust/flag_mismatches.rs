if a.chars().count() != b.chars().count() {
    return None;
}
Some(a.chars().zip(b.chars()).filter(|(x, y)| x != y).count() as i64)
}
