text.chars().rev().collect()
}
