#include <iostream>
#include <vector>

int main() {
    std::ios::sync_with_stdio(false);
    std::cin.tie(nullptr);
    int r, c;
    std::cin >> r >> c;
    std::vector<std::vector<int>> g(r, std::vector<int>(c));
    for (auto& row : g)
        for (auto& x : row) std::cin >> x;
    for (int j = 0; j < c; ++j) {
        for (int i = r - 1; i >= 0; --i) std::cout << g[i][j] << (i > 0 ? ' ' : '\n');
    }
}
