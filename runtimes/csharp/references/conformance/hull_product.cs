    BigInteger product = BigInteger.One;
    foreach (BigInteger serial in serials)
    {
        product *= serial;
    }
    return product;
}
