std::set<std::string> nodes;
for (const auto& [source, targets] : adj) {
    nodes.insert(source);
    nodes.insert(targets.begin(), targets.end());
}
// Everything reachable from a node in one or more links.
auto reach_from = [&adj](const std::string& origin) {
    std::set<std::string> seen;
    std::vector<std::string> stack{origin};
    while (!stack.empty()) {
        const std::string node = stack.back();
        stack.pop_back();
        const auto edges = adj.find(node);
        if (edges == adj.end()) {
            continue;
        }
        for (const auto& next : edges->second) {
            if (seen.insert(next).second) {
                stack.push_back(next);
            }
        }
    }
    return seen;
};
std::map<std::string, std::set<std::string>> reach;
for (const auto& node : nodes) {
    reach[node] = reach_from(node);
}
std::set<std::string> assigned;
int64_t loops = 0;
for (const auto& node : nodes) {
    if (assigned.count(node) || !reach[node].count(node)) {
        continue;
    }
    for (const auto& other : reach[node]) {
        if (reach[other].count(node)) {
            assigned.insert(other);
        }
    }
    ++loops;
}
return loops;
}
