if (readings.empty()) {
    return 0;
}
const auto [low, high] = std::minmax_element(readings.begin(), readings.end());
return *high - *low;
}
