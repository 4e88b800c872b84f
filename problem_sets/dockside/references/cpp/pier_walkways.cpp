#include <cstdio>
#include <numeric>
#include <utility>
#include <vector>

static std::vector<int> parent, group_size;

static int find(int x) {
    int root = x;
    while (parent[root] != root) root = parent[root];
    while (parent[x] != root) {  // path compression
        int next = parent[x];
        parent[x] = root;
        x = next;
    }
    return root;
}

int main() {
    int n, m;
    if (std::scanf("%d %d", &n, &m) != 2) return 1;
    parent.resize(n + 1);
    std::iota(parent.begin(), parent.end(), 0);
    group_size.assign(n + 1, 1);
    int groups = n, joined = n == 1 ? 0 : -1, wasted = 0;
    for (int j = 1; j <= m; ++j) {
        int u, v;
        if (std::scanf("%d %d", &u, &v) != 2) return 1;
        int a = find(u), b = find(v);
        if (a == b) {
            ++wasted;
            continue;
        }
        if (group_size[a] < group_size[b]) std::swap(a, b);
        parent[b] = a;
        group_size[a] += group_size[b];
        if (--groups == 1) joined = j;
    }
    std::printf("%d %d\n", joined, wasted);
}
