let mut out = String::new();
let mut chars = text.chars().peekable();
while let Some(ch) = chars.next() {
    let mut length = 1;
    while chars.next_if_eq(&ch).is_some() {
        length += 1;
    }
    out.push_str(&length.to_string());
    out.push(ch);
}
out
}
