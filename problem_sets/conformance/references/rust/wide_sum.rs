values.iter().sum()
}
