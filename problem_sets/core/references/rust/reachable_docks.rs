// A BTreeSet of str iterates in UTF-8 byte order, which is code point order.
let mut seen: BTreeSet<&str> = BTreeSet::new();
seen.insert(start.as_str());
let mut stack = vec![start.as_str()];
while let Some(dock) = stack.pop() {
    for next in adj.get(dock).into_iter().flatten() {
        if seen.insert(next.as_str()) {
            stack.push(next.as_str());
        }
    }
}
seen.into_iter().map(String::from).collect()
}
