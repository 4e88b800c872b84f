(1..=count).filter(|berth| !taken.contains(berth)).collect()
}
