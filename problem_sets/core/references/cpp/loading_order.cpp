std::map<std::string, std::set<std::string>> needs;
std::map<std::string, std::vector<std::string>> users;
for (const auto& [item, before] : deps) {
    needs[item];
    for (const auto& other : before) {
        needs[other];
        if (needs[item].insert(other).second) {
            users[other].push_back(item);
        }
    }
}
std::map<std::string, size_t> remaining;
std::priority_queue<std::string, std::vector<std::string>, std::greater<std::string>> ready;
for (const auto& [item, prerequisites] : needs) {
    remaining[item] = prerequisites.size();
    if (prerequisites.empty()) {
        ready.push(item);
    }
}
std::vector<std::string> order;
while (!ready.empty()) {
    const std::string item = ready.top();
    ready.pop();
    order.push_back(item);
    for (const auto& user : users[item]) {
        if (--remaining[user] == 0) {
            ready.push(user);
        }
    }
}
if (order.size() != needs.size()) {
    return std::nullopt;
}
return order;
}
