let mut out = String::new();
let mut count = 0;
for ch in code.chars() {
    // to_digit(10) accepts only the ASCII digits 0-9.
    if let Some(digit) = ch.to_digit(10) {
        count = count * 10 + digit as usize;
    } else {
        out.extend(std::iter::repeat(ch).take(count));
        count = 0;
    }
}
out
}
