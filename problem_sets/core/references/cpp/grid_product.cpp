if (a.empty()) {
    return {};
}
const size_t columns = b[0].size();
std::vector<std::vector<int64_t>> product(a.size(), std::vector<int64_t>(columns, 0));
for (size_t i = 0; i < a.size(); ++i) {
    for (size_t t = 0; t < a[i].size(); ++t) {
        for (size_t j = 0; j < columns; ++j) {
            product[i][j] += a[i][t] * b[t][j];
        }
    }
}
return product;
}
