let step = shift.rem_euclid(26) as u8;
text.chars()
    .map(|ch| match ch {
        'a'..='z' => ((ch as u8 - b'a' + step) % 26 + b'a') as char,
        'A'..='Z' => ((ch as u8 - b'A' + step) % 26 + b'A') as char,
        _ => ch,
    })
    .collect()
}
