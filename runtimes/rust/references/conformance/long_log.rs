(entries.chars().count() as i64, marks.iter().sum())
}
