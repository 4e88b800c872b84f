fn gcd(mut a: i64, mut b: i64) -> i64 {
    a = a.abs();
    b = b.abs();
    while b != 0 {
        let rest = a % b;
        a = b;
        b = rest;
    }
    a
}
// Reducing after every step keeps the denominator a divisor of the denominators' least
// common multiple, so every intermediate value stays small.
let mut num: i64 = 0;
let mut den: i64 = 1;
for (p, q) in fracs {
    num = num * q + p * den;
    den *= q;
    if den < 0 {
        num = -num;
        den = -den;
    }
    let g = gcd(num, den);
    num /= g;
    den /= g;
}
(num, den)
}
