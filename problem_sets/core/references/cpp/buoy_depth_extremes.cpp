if (values.empty()) {
    return std::nullopt;
}
const auto [low, high] = std::minmax_element(values.begin(), values.end());
return std::make_tuple(*low, *high);
}
