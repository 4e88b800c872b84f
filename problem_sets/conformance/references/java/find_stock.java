    return stock.get(item);
}
