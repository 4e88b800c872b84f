let mut result = vec![-1; heights.len()];
// Indices still looking for a taller lighthouse, their heights non-increasing.
let mut waiting: Vec<usize> = Vec::new();
for (i, &height) in heights.iter().enumerate() {
    while let Some(&top) = waiting.last() {
        if heights[top] >= height {
            break;
        }
        result[top] = i as i64;
        waiting.pop();
    }
    waiting.push(i);
}
result
}
