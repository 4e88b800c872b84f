return stock.get(item)
