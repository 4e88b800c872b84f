auto code_points = [](const std::string& text) {
    std::vector<std::string> points;
    for (size_t i = 0; i < text.size();) {
        size_t end = i + 1;
        while (end < text.size() && (static_cast<unsigned char>(text[end]) & 0xC0) == 0x80) {
            ++end;
        }
        points.push_back(text.substr(i, end - i));
        i = end;
    }
    return points;
};
const auto from = code_points(a);
const auto to = code_points(b);
std::vector<int64_t> previous(to.size() + 1);
std::iota(previous.begin(), previous.end(), 0);
for (size_t i = 1; i <= from.size(); ++i) {
    std::vector<int64_t> current(to.size() + 1);
    current[0] = static_cast<int64_t>(i);
    for (size_t j = 1; j <= to.size(); ++j) {
        current[j] = std::min({previous[j] + 1, current[j - 1] + 1,
                               previous[j - 1] + (from[i - 1] == to[j - 1] ? 0 : 1)});
    }
    previous = std::move(current);
}
return previous[to.size()];
}
