let letters_end = code
    .find(|ch: char| !ch.is_ascii_uppercase())
    .unwrap_or(code.len());
let (letters, digits) = code.split_at(letters_end);
if letters.is_empty()
    || digits.is_empty()
    || digits.len() > 18
    || !digits.bytes().all(|b| b.is_ascii_digit())
{
    return None;
}
Some((letters.to_string(), digits.parse().ok()?))
}
