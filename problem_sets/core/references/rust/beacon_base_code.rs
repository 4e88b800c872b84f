let radix = base as u32;
// unsigned_abs covers i64::MIN, whose absolute value has no i64.
let mut rest = n.unsigned_abs();
if rest == 0 {
    return "0".to_string();
}
let mut digits = Vec::new();
while rest > 0 {
    let digit = (rest % u64::from(radix)) as u32;
    digits.push(char::from_digit(digit, radix).expect("a digit below the base"));
    rest /= u64::from(radix);
}
if n < 0 {
    digits.push('-');
}
digits.iter().rev().collect()
}
