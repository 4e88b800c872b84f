fn trim(part: &str) -> &str {
    part.trim_matches(|ch: char| ch == ' ' || ch == '\t')
}
let mut totals = HashMap::new();
for line in text.split('\n') {
    if trim(line).is_empty() {
        continue;
    }
    if let Some((name, quantity)) = line.split_once(':') {
        // i64 parsing accepts an optional leading "+" or "-".
        if let Ok(quantity) = trim(quantity).parse::<i64>() {
            *totals.entry(trim(name).to_string()).or_insert(0) += quantity;
        }
    }
}
totals
}
