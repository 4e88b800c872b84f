double total = 0.0;
double total_weight = 0.0;
for (size_t i = 0; i < values.size(); ++i) {
    total += values[i] * weights[i];
    total_weight += weights[i];
}
if (total_weight == 0.0) {
    return std::nullopt;
}
return total / total_weight;
}
