std::map<std::string, size_t> index;
for (size_t i = 0; i < docks.size(); ++i) {
    index[docks[i]] = i;
}
std::vector<size_t> parent(docks.size());
std::iota(parent.begin(), parent.end(), 0);
auto find = [&parent](size_t node) {
    while (parent[node] != node) {
        parent[node] = parent[parent[node]];
        node = parent[node];
    }
    return node;
};
auto by_cost = cables;
std::stable_sort(by_cost.begin(), by_cost.end(),
                 [](const auto& x, const auto& y) { return std::get<2>(x) < std::get<2>(y); });
int64_t total = 0;
size_t joined = 0;
for (const auto& [a, b, cost] : by_cost) {
    const size_t root_a = find(index.at(a));
    const size_t root_b = find(index.at(b));
    if (root_a != root_b) {
        parent[root_a] = root_b;
        total += cost;
        ++joined;
    }
}
if (docks.size() > 1 && joined != docks.size() - 1) {
    return std::nullopt;
}
return total;
}
