if (grid.empty() || grid[0].empty()) {
    return {};
}
std::vector<std::vector<int64_t>> columns(grid[0].size(), std::vector<int64_t>(grid.size()));
for (size_t row = 0; row < grid.size(); ++row) {
    for (size_t column = 0; column < grid[row].size(); ++column) {
        columns[column][row] = grid[row][column];
    }
}
return columns;
}
