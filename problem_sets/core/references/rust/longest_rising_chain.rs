// tails[k]: the smallest last reading of a rising chain of k + 1 readings seen so far.
let mut tails: Vec<i64> = Vec::new();
for value in values {
    let position = tails.partition_point(|&tail| tail < value);
    if position == tails.len() {
        tails.push(value);
    } else {
        tails[position] = value;
    }
}
tails.len() as i64
}
