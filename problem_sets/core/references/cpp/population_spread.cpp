if (values.empty()) {
    return 0.0;
}
const double count = static_cast<double>(values.size());
const double mean = std::accumulate(values.begin(), values.end(), 0.0) / count;
double squares = 0.0;
for (double value : values) {
    squares += (value - mean) * (value - mean);
}
return std::sqrt(squares / count);
}
