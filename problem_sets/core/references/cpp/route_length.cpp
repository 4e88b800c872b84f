double total = 0.0;
for (size_t i = 1; i < points.size(); ++i) {
    const auto [x1, y1] = points[i - 1];
    const auto [x2, y2] = points[i];
    total += std::hypot(x2 - x1, y2 - y1);
}
return total;
}
