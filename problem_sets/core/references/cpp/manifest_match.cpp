auto code_points = [](const std::string& s) {
    std::vector<std::string> points;
    for (size_t i = 0; i < s.size();) {
        size_t end = i + 1;
        while (end < s.size() && (static_cast<unsigned char>(s[end]) & 0xC0) == 0x80) {
            ++end;
        }
        points.push_back(s.substr(i, end - i));
        i = end;
    }
    return points;
};
const auto wanted = code_points(pattern);
const auto chars = code_points(text);
// matches[j]: the pattern prefix processed so far matches the first j characters.
std::vector<bool> matches(chars.size() + 1, false);
matches[0] = true;
for (const auto& p : wanted) {
    std::vector<bool> next(chars.size() + 1, false);
    if (p == "*") {
        bool seen = false;
        for (size_t j = 0; j <= chars.size(); ++j) {
            seen = seen || matches[j];
            next[j] = seen;
        }
    } else {
        for (size_t j = 1; j <= chars.size(); ++j) {
            next[j] = matches[j - 1] && (p == "?" || p == chars[j - 1]);
        }
    }
    matches = std::move(next);
}
return matches[chars.size()];
}
