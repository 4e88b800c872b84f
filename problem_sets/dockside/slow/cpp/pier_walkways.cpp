// Slow on purpose (correct, O(n*m)): keep a group label per pier and relabel every pier of one
// group when a walkway joins two groups.
#include <cstdio>
#include <numeric>
#include <vector>

int main() {
    int n, m;
    if (std::scanf("%d %d", &n, &m) != 2) return 1;
    std::vector<int> label(n + 1);
    std::iota(label.begin(), label.end(), 0);
    int groups = n, joined = n == 1 ? 0 : -1, wasted = 0;
    for (int j = 1; j <= m; ++j) {
        int u, v;
        if (std::scanf("%d %d", &u, &v) != 2) return 1;
        int a = label[u], b = label[v];
        if (a == b) {
            ++wasted;
            continue;
        }
        for (int p = 1; p <= n; ++p)
            if (label[p] == b) label[p] = a;
        if (--groups == 1) joined = j;
    }
    std::printf("%d %d\n", joined, wasted);
}
