let mut groups: HashMap<String, Vec<String>> = HashMap::new();
for word in words {
    if let Some(initial) = word.chars().next() {
        groups.entry(initial.to_string()).or_default().push(word);
    }
}
groups
}
