#include <cstdint>
#include <cstdio>
#include <utility>
#include <vector>

static std::vector<std::vector<std::pair<int, int64_t>>> adjacent;

// The islet farthest from source and its distance, by an explicit-stack walk.
static std::pair<int, int64_t> farthest(int n, int source) {
    std::vector<int64_t> dist(n + 1, -1);
    std::vector<int> stack{source};
    dist[source] = 0;
    while (!stack.empty()) {
        int u = stack.back();
        stack.pop_back();
        for (auto [v, c] : adjacent[u])
            if (dist[v] < 0) {
                dist[v] = dist[u] + c;
                stack.push_back(v);
            }
    }
    int best = 1;
    for (int v = 2; v <= n; ++v)
        if (dist[v] > dist[best]) best = v;
    return {best, dist[best]};
}

int main() {
    int n;
    if (std::scanf("%d", &n) != 1) return 1;
    adjacent.resize(n + 1);
    for (int i = 0; i < n - 1; ++i) {
        int a, b;
        int64_t c;
        if (std::scanf("%d %d %ld", &a, &b, &c) != 3) return 1;
        adjacent[a].push_back({b, c});
        adjacent[b].push_back({a, c});
    }
    // The islet farthest from any islet is an end of a longest route.
    int end = farthest(n, 1).first;
    std::printf("%ld\n", farthest(n, end).second);
}
