use std::cmp::Reverse;
if start == goal {
    return Some(0);
}
let mut graph: HashMap<&str, Vec<(&str, i64)>> = HashMap::new();
for (a, b, cost) in &routes {
    graph
        .entry(a.as_str())
        .or_default()
        .push((b.as_str(), *cost));
    graph
        .entry(b.as_str())
        .or_default()
        .push((a.as_str(), *cost));
}
// Dijkstra with a min-heap; stale heap entries are skipped when popped.
let mut best: HashMap<&str, i64> = HashMap::new();
let mut heap = BinaryHeap::new();
best.insert(start.as_str(), 0);
heap.push(Reverse((0i64, start.as_str())));
while let Some(Reverse((dist, island))) = heap.pop() {
    if island == goal.as_str() {
        return Some(dist);
    }
    if dist > best[island] {
        continue;
    }
    for &(next, cost) in graph.get(island).into_iter().flatten() {
        let candidate = dist + cost;
        if best.get(next).map_or(true, |&known| candidate < known) {
            best.insert(next, candidate);
            heap.push(Reverse((candidate, next)));
        }
    }
}
None
}
