n > 0 && n.count_ones() == 1
}
