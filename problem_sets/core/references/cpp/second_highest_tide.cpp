if (values.empty()) {
    return std::nullopt;
}
const int64_t top = *std::max_element(values.begin(), values.end());
std::optional<int64_t> second;
for (int64_t value : values) {
    if (value < top && (!second || value > *second)) {
        second = value;
    }
}
return second;
}
