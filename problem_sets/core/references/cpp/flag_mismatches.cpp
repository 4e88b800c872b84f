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
const auto left = code_points(a);
const auto right = code_points(b);
if (left.size() != right.size()) {
    return std::nullopt;
}
int64_t differences = 0;
for (size_t i = 0; i < left.size(); ++i) {
    if (left[i] != right[i]) {
        ++differences;
    }
}
return differences;
}
