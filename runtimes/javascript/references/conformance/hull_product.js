let product = 1n;
for (const serial of serials) product *= serial;
return product;
}
