if (start == goal) {
    return 0;
}
std::map<std::string, std::vector<std::pair<std::string, int64_t>>> graph;
for (const auto& [a, b, cost] : routes) {
    graph[a].emplace_back(b, cost);
    graph[b].emplace_back(a, cost);
}
using Entry = std::pair<int64_t, std::string>;
std::priority_queue<Entry, std::vector<Entry>, std::greater<Entry>> frontier;
std::map<std::string, int64_t> best{{start, 0}};
frontier.emplace(0, start);
while (!frontier.empty()) {
    const auto [distance, island] = frontier.top();
    frontier.pop();
    if (island == goal) {
        return distance;
    }
    if (distance > best[island]) {
        continue;
    }
    const auto edges = graph.find(island);
    if (edges == graph.end()) {
        continue;
    }
    for (const auto& [next, cost] : edges->second) {
        const int64_t candidate = distance + cost;
        const auto known = best.find(next);
        if (known == best.end() || candidate < known->second) {
            best[next] = candidate;
            frontier.emplace(candidate, next);
        }
    }
}
return std::nullopt;
}
