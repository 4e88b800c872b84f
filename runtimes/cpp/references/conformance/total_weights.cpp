double total = 0.0;
for (const auto& [crate, items] : crates) {
    for (const auto& [item, weight] : items) {
        total += weight;
    }
}
return total;
}
