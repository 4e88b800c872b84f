std::vector<int64_t> totals;
for (const auto& row : grid) {
    if (row.size() > totals.size()) {
        totals.resize(row.size(), 0);
    }
    for (size_t j = 0; j < row.size(); ++j) {
        totals[j] += row[j];
    }
}
return totals;
}
