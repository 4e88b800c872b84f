fn targets<'a>(adj: &'a HashMap<String, Vec<String>>, node: &str) -> &'a [String] {
    adj.get(node).map_or(&[], |list| list.as_slice())
}
let mut nodes: BTreeSet<&str> = BTreeSet::new();
for (node, list) in &adj {
    nodes.insert(node.as_str());
    nodes.extend(list.iter().map(String::as_str));
}
// Everything reachable from each node in one or more links.
let mut reach: HashMap<&str, HashSet<&str>> = HashMap::new();
for &node in &nodes {
    let mut seen: HashSet<&str> = HashSet::new();
    let mut stack: Vec<&str> = targets(&adj, node).iter().map(String::as_str).collect();
    while let Some(next) = stack.pop() {
        if seen.insert(next) {
            stack.extend(targets(&adj, next).iter().map(String::as_str));
        }
    }
    reach.insert(node, seen);
}
// A node that reaches itself lies on a loop: the loop is every node it reaches that reaches it back.
let mut assigned: HashSet<&str> = HashSet::new();
let mut loops = 0;
for &node in &nodes {
    if assigned.contains(node) || !reach[node].contains(node) {
        continue;
    }
    for &other in &reach[node] {
        if reach[other].contains(node) {
            assigned.insert(other);
        }
    }
    loops += 1;
}
loops
}
