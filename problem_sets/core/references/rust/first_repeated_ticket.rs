let mut seen: HashSet<&str> = HashSet::new();
tickets
    .iter()
    .find(|ticket| !seen.insert(ticket.as_str()))
    .cloned()
}
