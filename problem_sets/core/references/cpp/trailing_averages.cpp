std::vector<double> averages;
const size_t size = static_cast<size_t>(window);
for (size_t end = size; end <= values.size(); ++end) {
    const double sum = std::accumulate(values.begin() + static_cast<std::ptrdiff_t>(end - size),
                                       values.begin() + static_cast<std::ptrdiff_t>(end), 0.0);
    averages.push_back(sum / static_cast<double>(window));
}
return averages;
}
