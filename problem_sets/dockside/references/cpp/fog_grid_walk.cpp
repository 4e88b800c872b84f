#include <iostream>
#include <queue>
#include <string>
#include <vector>

int main() {
    int r, c;
    std::cin >> r >> c;
    std::vector<std::string> grid(r);
    for (auto& row : grid) std::cin >> row;
    std::vector<std::vector<int>> steps(r, std::vector<int>(c, -1));
    std::queue<std::pair<int, int>> queue;
    for (int i = 0; i < r; ++i)
        for (int j = 0; j < c; ++j)
            if (grid[i][j] == 'S') {
                steps[i][j] = 0;
                queue.push({i, j});
            }
    const int di[] = {-1, 1, 0, 0}, dj[] = {0, 0, -1, 1};
    while (!queue.empty()) {
        auto [i, j] = queue.front();
        queue.pop();
        if (grid[i][j] == 'T') {
            std::cout << steps[i][j] << '\n';
            return 0;
        }
        for (int d = 0; d < 4; ++d) {
            int ni = i + di[d], nj = j + dj[d];
            if (ni >= 0 && ni < r && nj >= 0 && nj < c && grid[ni][nj] != '#' && steps[ni][nj] < 0) {
                steps[ni][nj] = steps[i][j] + 1;
                queue.push({ni, nj});
            }
        }
    }
    std::cout << -1 << '\n';
}
