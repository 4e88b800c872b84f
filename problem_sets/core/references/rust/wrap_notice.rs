let mut lines = Vec::new();
let mut current = String::new();
let mut current_length: i64 = 0;
for word in words {
    let length = word.chars().count() as i64;
    if current.is_empty() {
        current = word;
        current_length = length;
    } else if current_length + 1 + length <= width {
        current.push(' ');
        current.push_str(&word);
        current_length += 1 + length;
    } else {
        lines.push(std::mem::replace(&mut current, word));
        current_length = length;
    }
}
if !current.is_empty() {
    lines.push(current);
}
lines
}
