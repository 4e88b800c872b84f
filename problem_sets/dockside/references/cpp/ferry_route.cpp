#include <cstdint>
#include <cstdio>
#include <functional>
#include <queue>
#include <string>
#include <utility>
#include <vector>

int main() {
    int n, m;
    if (std::scanf("%d %d", &n, &m) != 2) return 1;
    std::vector<std::vector<std::pair<int, int64_t>>> adjacent(n + 1);
    for (int i = 0; i < m; ++i) {
        int u, v;
        int64_t w;
        if (std::scanf("%d %d %ld", &u, &v, &w) != 3) return 1;
        adjacent[u].push_back({v, w});
        adjacent[v].push_back({u, w});
    }
    const int64_t unreached = INT64_MAX;
    std::vector<int64_t> dist(n + 1, unreached);
    std::vector<int> came_from(n + 1, 0);
    using Item = std::pair<int64_t, int>;
    std::priority_queue<Item, std::vector<Item>, std::greater<Item>> heap;
    dist[1] = 0;
    heap.push({0, 1});
    while (!heap.empty()) {
        auto [d, u] = heap.top();
        heap.pop();
        if (d > dist[u]) continue;
        if (u == n) break;
        for (auto [v, w] : adjacent[u]) {
            if (d + w < dist[v]) {
                dist[v] = d + w;
                came_from[v] = u;
                heap.push({dist[v], v});
            }
        }
    }
    if (dist[n] == unreached) {
        std::printf("-1\n");
        return 0;
    }
    std::vector<int> route{n};
    while (route.back() != 1) route.push_back(came_from[route.back()]);
    std::string out = std::to_string(dist[n]) + "\n";
    for (size_t i = route.size(); i-- > 0;) out += std::to_string(route[i]) + (i ? " " : "\n");
    std::fputs(out.c_str(), stdout);
}
