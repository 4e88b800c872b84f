let mut shifts = shifts;
shifts.sort_unstable();
let mut merged: Vec<(i64, i64)> = Vec::new();
for (start, end) in shifts {
    if let Some(last) = merged.last_mut() {
        if start <= last.1.saturating_add(1) {
            last.1 = last.1.max(end);
            continue;
        }
    }
    merged.push((start, end));
}
merged
}
