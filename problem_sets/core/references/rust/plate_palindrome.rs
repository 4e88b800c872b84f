let kept: Vec<u8> = plate
    .bytes()
    .filter(u8::is_ascii_alphanumeric)
    .map(|b| b.to_ascii_lowercase())
    .collect();
kept.iter().eq(kept.iter().rev())
}
