positions.windows(2).map(|pair| pair[1] - pair[0]).collect()
}
