    return new StringBuilder(text).reverse().toString();
}
