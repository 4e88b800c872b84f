flags.into_iter().map(|flag| !flag).collect()
}
