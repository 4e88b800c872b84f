let mut counts = HashMap::new();
for ch in text.chars() {
    *counts.entry(ch.to_string()).or_insert(0) += 1;
}
counts
}
