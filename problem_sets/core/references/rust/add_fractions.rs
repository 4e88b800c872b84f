// Sums of up to ten denominators of up to 1000 outgrow i64 before they are reduced, so the
// arithmetic runs in i128 and only the reduced result is narrowed.
fn gcd(mut a: i128, mut b: i128) -> i128 {
    a = a.abs();
    b = b.abs();
    while b != 0 {
        let rest = a % b;
        a = b;
        b = rest;
    }
    a
}
let mut num: i128 = 0;
let mut den: i128 = 1;
for (p, q) in fracs {
    let (p, q) = (i128::from(p), i128::from(q));
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
(num as i64, den as i64)
}
