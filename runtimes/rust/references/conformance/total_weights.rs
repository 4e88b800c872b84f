crates.values().flat_map(|items| items.values()).sum()
}
