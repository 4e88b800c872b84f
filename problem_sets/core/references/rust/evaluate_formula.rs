// Recursive descent over the bytes; every level returns None once a division by zero has
// happened, which is then the answer.
fn peek(bytes: &[u8], pos: &mut usize) -> Option<u8> {
    while bytes.get(*pos) == Some(&b' ') {
        *pos += 1;
    }
    bytes.get(*pos).copied()
}
fn sum(bytes: &[u8], pos: &mut usize) -> Option<i64> {
    let mut value = product(bytes, pos)?;
    while let Some(op @ (b'+' | b'-')) = peek(bytes, pos) {
        *pos += 1;
        let right = product(bytes, pos)?;
        value = if op == b'+' {
            value + right
        } else {
            value - right
        };
    }
    Some(value)
}
fn product(bytes: &[u8], pos: &mut usize) -> Option<i64> {
    let mut value = unary(bytes, pos)?;
    while let Some(op @ (b'*' | b'/')) = peek(bytes, pos) {
        *pos += 1;
        let right = unary(bytes, pos)?;
        // i64 division truncates toward zero; checked_div is None for a zero divisor.
        value = if op == b'*' {
            value * right
        } else {
            value.checked_div(right)?
        };
    }
    Some(value)
}
fn unary(bytes: &[u8], pos: &mut usize) -> Option<i64> {
    if peek(bytes, pos) == Some(b'-') {
        *pos += 1;
        return Some(-unary(bytes, pos)?);
    }
    atom(bytes, pos)
}
fn atom(bytes: &[u8], pos: &mut usize) -> Option<i64> {
    if peek(bytes, pos) == Some(b'(') {
        *pos += 1;
        let value = sum(bytes, pos)?;
        peek(bytes, pos);
        *pos += 1;
        return Some(value);
    }
    let mut value: i64 = 0;
    while let Some(digit @ b'0'..=b'9') = bytes.get(*pos).copied() {
        value = value * 10 + i64::from(digit - b'0');
        *pos += 1;
    }
    Some(value)
}
let mut pos = 0;
sum(expr.as_bytes(), &mut pos)
}
