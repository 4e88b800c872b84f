let source: Vec<char> = a.chars().collect();
let target: Vec<char> = b.chars().collect();
// previous[j]: edits turning the source read so far into the first j target characters.
let mut previous: Vec<usize> = (0..=target.len()).collect();
for (i, &from) in source.iter().enumerate() {
    let mut current = Vec::with_capacity(target.len() + 1);
    current.push(i + 1);
    for (j, &to) in target.iter().enumerate() {
        let replace = previous[j] + usize::from(from != to);
        current.push(replace.min(previous[j + 1] + 1).min(current[j] + 1));
    }
    previous = current;
}
previous[target.len()] as i64
}
