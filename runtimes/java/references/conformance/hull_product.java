    BigInteger product = BigInteger.ONE;
    for (BigInteger serial : serials) {
        product = product.multiply(serial);
    }
    return product;
}
