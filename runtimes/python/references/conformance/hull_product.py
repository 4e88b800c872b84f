product = 1
for serial in serials:
    product *= serial
return product
