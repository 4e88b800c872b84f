if (weights.empty()) {
    return std::nullopt;
}
return std::accumulate(weights.begin(), weights.end(), 0.0) / static_cast<double>(weights.size());
}
