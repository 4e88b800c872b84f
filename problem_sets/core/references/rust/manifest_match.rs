let text: Vec<char> = text.chars().collect();
// matches[j]: the pattern read so far matches the first j characters of the text.
let mut matches = vec![false; text.len() + 1];
matches[0] = true;
for p in pattern.chars() {
    let mut next = vec![false; text.len() + 1];
    if p == '*' {
        let mut seen = false;
        for j in 0..=text.len() {
            seen = seen || matches[j];
            next[j] = seen;
        }
    } else {
        for j in 1..=text.len() {
            next[j] = matches[j - 1] && (p == '?' || p == text[j - 1]);
        }
    }
    matches = next;
}
matches[text.len()]
}
