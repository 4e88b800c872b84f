// Slow on purpose (correct, O(total painted length)): paint every segment of every job.
#include <cstdio>
#include <vector>

int main() {
    int n, m, k;
    if (std::scanf("%d %d %d", &n, &m, &k) != 3) return 1;
    std::vector<int> coats(n + 1, 0);
    for (int j = 0; j < m; ++j) {
        int l, r;
        if (std::scanf("%d %d", &l, &r) != 2) return 1;
        for (int s = l; s <= r; ++s) ++coats[s];
    }
    int count = 0;
    for (int s = 1; s <= n; ++s)
        if (coats[s] >= k) ++count;
    std::printf("%d\n", count);
}
