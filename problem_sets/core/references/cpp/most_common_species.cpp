// std::map orders std::string keys bytewise, and UTF-8 byte order is code point order.
std::map<std::string, int64_t> counts;
for (const auto& name : species) {
    ++counts[name];
}
std::optional<std::string> best;
int64_t best_count = 0;
for (const auto& [name, count] : counts) {
    if (count > best_count) {
        best = name;
        best_count = count;
    }
}
return best;
}
