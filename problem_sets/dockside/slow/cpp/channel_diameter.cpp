// Slow on purpose (correct, quadratic): walk the whole marsh from every islet.
#include <algorithm>
#include <cstdint>
#include <cstdio>
#include <utility>
#include <vector>

int main() {
    int n;
    if (std::scanf("%d", &n) != 1) return 1;
    std::vector<std::vector<std::pair<int, int64_t>>> adjacent(n + 1);
    for (int i = 0; i < n - 1; ++i) {
        int a, b;
        int64_t c;
        if (std::scanf("%d %d %ld", &a, &b, &c) != 3) return 1;
        adjacent[a].push_back({b, c});
        adjacent[b].push_back({a, c});
    }
    int64_t best = 0;
    std::vector<int64_t> dist(n + 1);
    std::vector<int> stack;
    for (int source = 1; source <= n; ++source) {
        std::fill(dist.begin(), dist.end(), -1);
        dist[source] = 0;
        stack.assign(1, source);
        while (!stack.empty()) {
            int u = stack.back();
            stack.pop_back();
            best = std::max(best, dist[u]);
            for (auto [v, c] : adjacent[u])
                if (dist[v] < 0) {
                    dist[v] = dist[u] + c;
                    stack.push_back(v);
                }
        }
    }
    std::printf("%ld\n", best);
}
