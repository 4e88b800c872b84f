return Object.hasOwn(stock, item) ? stock[item] : null;
}
