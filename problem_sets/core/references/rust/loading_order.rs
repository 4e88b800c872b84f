// Each item's distinct prerequisites, and for each item the items waiting on it.
let mut needs: HashMap<&str, HashSet<&str>> = HashMap::new();
for (item, before) in &deps {
    needs
        .entry(item.as_str())
        .or_default()
        .extend(before.iter().map(String::as_str));
    for other in before {
        needs.entry(other.as_str()).or_default();
    }
}
let mut users: HashMap<&str, Vec<&str>> = HashMap::new();
for (&item, before) in &needs {
    for &other in before {
        users.entry(other).or_default().push(item);
    }
}
let mut remaining: HashMap<&str, usize> = needs
    .iter()
    .map(|(&item, before)| (item, before.len()))
    .collect();
// str order compares UTF-8 bytes, which is the same as comparing code points.
let mut ready: BTreeSet<&str> = remaining
    .iter()
    .filter(|&(_, &count)| count == 0)
    .map(|(&item, _)| item)
    .collect();
let mut order = Vec::with_capacity(needs.len());
while let Some(item) = ready.iter().next().copied() {
    ready.remove(item);
    order.push(item.to_string());
    for &user in users.get(item).into_iter().flatten() {
        let count = remaining.get_mut(user).expect("every user is an item");
        *count -= 1;
        if *count == 0 {
            ready.insert(user);
        }
    }
}
if order.len() == needs.len() {
    Some(order)
} else {
    None
}
}
