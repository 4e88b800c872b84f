if start == goal {
    return Some(0);
}
let mut hops: HashMap<&str, i64> = HashMap::new();
hops.insert(start.as_str(), 0);
let mut queue = VecDeque::from([start.as_str()]);
while let Some(dock) = queue.pop_front() {
    let next_hops = hops[dock] + 1;
    for next in adj.get(dock).into_iter().flatten() {
        if hops.contains_key(next.as_str()) {
            continue;
        }
        if *next == goal {
            return Some(next_hops);
        }
        hops.insert(next.as_str(), next_hops);
        queue.push_back(next.as_str());
    }
}
None
}
