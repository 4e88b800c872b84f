let mut rest = n;
let mut factors = HashMap::new();
// Trial division up to the square root of what is left: at most 10^6 for n <= 10^12.
let mut divisor = 2;
while divisor * divisor <= rest {
    while rest % divisor == 0 {
        *factors.entry(divisor.to_string()).or_insert(0) += 1;
        rest /= divisor;
    }
    divisor += if divisor == 2 { 1 } else { 2 };
}
if rest > 1 {
    *factors.entry(rest.to_string()).or_insert(0) += 1;
}
factors
}
