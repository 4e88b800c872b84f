let mut names: Vec<String> = tally
    .into_iter()
    .filter(|(_, count)| *count == target)
    .map(|(name, _)| name)
    .collect();
// String order compares UTF-8 bytes, which is the same as comparing code points.
names.sort_unstable();
names
}
