// Slow on purpose (correct, O(n^2)): Dijkstra's algorithm without a heap, scanning every
// harbour for the nearest unsettled one.
#include <cstdint>
#include <cstdio>
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
    std::vector<char> settled(n + 1, 0);
    dist[1] = 0;
    while (true) {
        int u = 0;
        for (int v = 1; v <= n; ++v)
            if (!settled[v] && dist[v] != unreached && (u == 0 || dist[v] < dist[u])) u = v;
        if (u == 0 || u == n) break;
        settled[u] = 1;
        for (auto [v, w] : adjacent[u])
            if (dist[u] + w < dist[v]) {
                dist[v] = dist[u] + w;
                came_from[v] = u;
            }
    }
    if (dist[n] == unreached) {
        std::printf("-1\n");
        return 0;
    }
    std::vector<int> route{n};
    while (route.back() != 1) route.push_back(came_from[route.back()]);
    std::printf("%ld\n", dist[n]);
    for (size_t i = route.size(); i-- > 0;) std::printf("%d%c", route[i], i ? ' ' : '\n');
}
