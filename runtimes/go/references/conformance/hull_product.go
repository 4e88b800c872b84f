product := big.NewInt(1)
for _, serial := range serials {
	product.Mul(product, serial)
}
return product
}
