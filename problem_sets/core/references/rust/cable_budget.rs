fn find(parent: &mut [usize], mut x: usize) -> usize {
    while parent[x] != x {
        parent[x] = parent[parent[x]];
        x = parent[x];
    }
    x
}
let index: HashMap<&str, usize> = docks
    .iter()
    .enumerate()
    .map(|(i, dock)| (dock.as_str(), i))
    .collect();
let mut parent: Vec<usize> = (0..docks.len()).collect();
// Kruskal: the cheapest cable that joins two separate networks is always worth laying.
let mut by_cost: Vec<&(String, String, i64)> = cables.iter().collect();
by_cost.sort_by_key(|cable| cable.2);
let mut total = 0;
let mut joined = 0;
for (a, b, cost) in by_cost {
    let root_a = find(&mut parent, index[a.as_str()]);
    let root_b = find(&mut parent, index[b.as_str()]);
    if root_a != root_b {
        parent[root_a] = root_b;
        total += cost;
        joined += 1;
    }
}
if docks.len() > 1 && joined != docks.len() - 1 {
    return None;
}
Some(total)
}
