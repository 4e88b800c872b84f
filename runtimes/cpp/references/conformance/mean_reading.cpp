if (readings.empty()) {
    return 0.0;
}
return std::accumulate(readings.begin(), readings.end(), 0.0) / static_cast<double>(readings.size());
}
