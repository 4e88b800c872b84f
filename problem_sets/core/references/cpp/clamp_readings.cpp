std::vector<int64_t> limited;
limited.reserve(values.size());
for (int64_t value : values) {
    if (low && value < *low) {
        value = *low;
    }
    if (high && value > *high) {
        value = *high;
    }
    limited.push_back(value);
}
return limited;
}
