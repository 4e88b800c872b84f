return std::accumulate(values.begin(), values.end(), int64_t{0});
}
