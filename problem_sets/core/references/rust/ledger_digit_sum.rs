// unsigned_abs covers i64::MIN, whose absolute value has no i64.
let mut rest = n.unsigned_abs();
let mut total = 0;
while rest > 0 {
    total += (rest % 10) as i64;
    rest /= 10;
}
total
}
