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
int64_t groups = static_cast<int64_t>(docks.size());
for (const auto& [a, b] : links) {
    const size_t root_a = find(index.at(a));
    const size_t root_b = find(index.at(b));
    if (root_a != root_b) {
        parent[root_a] = root_b;
        --groups;
    }
}
return groups;
}
