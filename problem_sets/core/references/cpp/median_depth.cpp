if (depths.empty()) {
    return std::nullopt;
}
std::vector<double> ordered = depths;
std::sort(ordered.begin(), ordered.end());
const size_t middle = ordered.size() / 2;
if (ordered.size() % 2 == 1) {
    return ordered[middle];
}
return (ordered[middle - 1] + ordered[middle]) / 2.0;
}
