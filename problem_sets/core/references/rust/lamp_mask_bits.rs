mask.count_ones() as i64
}
