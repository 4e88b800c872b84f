std::vector<int64_t> gaps;
for (size_t i = 1; i < positions.size(); ++i) {
    gaps.push_back(positions[i] - positions[i - 1]);
}
return gaps;
}
