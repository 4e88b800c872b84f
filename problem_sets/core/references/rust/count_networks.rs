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
let mut networks = docks.len() as i64;
for (a, b) in &links {
    let root_a = find(&mut parent, index[a.as_str()]);
    let root_b = find(&mut parent, index[b.as_str()]);
    if root_a != root_b {
        parent[root_a] = root_b;
        networks -= 1;
    }
}
networks
}
