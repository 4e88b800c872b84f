stock.get(&item).copied()
}
