std::map<std::string, std::pair<double, int64_t>> totals;
for (const auto& [boat, weight] : catches) {
    auto& [sum, count] = totals[boat];
    sum += weight;
    ++count;
}
std::map<std::string, double> means;
for (const auto& [boat, total] : totals) {
    means[boat] = total.first / static_cast<double>(total.second);
}
return means;
}
