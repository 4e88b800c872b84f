let mut groups: HashMap<String, Vec<String>> = HashMap::new();
for name in names {
    if let Some(initial) = name.chars().next() {
        groups.entry(initial.to_string()).or_default().push(name);
    }
}
groups
}
