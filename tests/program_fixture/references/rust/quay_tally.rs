use std::io::Read;

fn main() {
    let mut text = String::new();
    std::io::stdin().read_to_string(&mut text).unwrap();
    let numbers: Vec<i64> = text.split_whitespace().map(|t| t.parse().unwrap()).collect();
    let weights = &numbers[1..1 + numbers[0] as usize];
    println!("{} {}", weights.iter().sum::<i64>(), weights.iter().max().unwrap());
}
