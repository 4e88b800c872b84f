// std::set orders names bytewise, which for UTF-8 is code point order.
std::set<std::string> seen{start};
std::vector<std::string> stack{start};
while (!stack.empty()) {
    const std::string dock = stack.back();
    stack.pop_back();
    const auto edges = adj.find(dock);
    if (edges == adj.end()) {
        continue;
    }
    for (const auto& next : edges->second) {
        if (seen.insert(next).second) {
            stack.push_back(next);
        }
    }
}
return std::vector<std::string>(seen.begin(), seen.end());
}
