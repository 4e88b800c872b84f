let mut divisor: u64 = 0;
for count in counts {
    let mut a = divisor;
    let mut b = count.unsigned_abs();
    while b != 0 {
        let rest = a % b;
        a = b;
        b = rest;
    }
    divisor = a;
}
divisor as i64
}
