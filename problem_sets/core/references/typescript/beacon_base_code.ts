// BigInt#toString writes lowercase digits and a leading "-" for negative values.
return n.toString(Number(base));
}
