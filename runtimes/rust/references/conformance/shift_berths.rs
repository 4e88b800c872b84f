owners.into_iter().map(|(berth, vessel)| (berth + offset, vessel)).collect()
}
