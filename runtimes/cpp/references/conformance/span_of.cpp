if (values.empty()) {
    return std::nullopt;
}
const auto [smallest, largest] = std::minmax_element(values.begin(), values.end());
return std::make_tuple(*smallest, *largest);
}
