auto ordered = shifts;
std::sort(ordered.begin(), ordered.end());
std::vector<std::tuple<int64_t, int64_t>> merged;
for (const auto& [start, end] : ordered) {
    if (!merged.empty() && start <= std::get<1>(merged.back()) + 1) {
        std::get<1>(merged.back()) = std::max(std::get<1>(merged.back()), end);
    } else {
        merged.emplace_back(start, end);
    }
}
return merged;
}
