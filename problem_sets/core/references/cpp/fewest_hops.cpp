if (start == goal) {
    return 0;
}
std::map<std::string, int64_t> distance{{start, 0}};
std::queue<std::string> frontier;
frontier.push(start);
while (!frontier.empty()) {
    const std::string dock = frontier.front();
    frontier.pop();
    const auto edges = adj.find(dock);
    if (edges == adj.end()) {
        continue;
    }
    for (const auto& next : edges->second) {
        if (distance.count(next)) {
            continue;
        }
        distance[next] = distance[dock] + 1;
        if (next == goal) {
            return distance[next];
        }
        frontier.push(next);
    }
}
return std::nullopt;
}
