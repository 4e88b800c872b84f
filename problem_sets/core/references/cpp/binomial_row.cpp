std::vector<int64_t> row{1};
for (int64_t i = 0; i < n; ++i) {
    std::vector<int64_t> next(row.size() + 1, 1);
    for (size_t k = 1; k < row.size(); ++k) {
        next[k] = row[k - 1] + row[k];
    }
    row = std::move(next);
}
return row;
}
