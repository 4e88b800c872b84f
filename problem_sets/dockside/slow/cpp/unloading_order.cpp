// Slow on purpose (correct, O(n * (n + m))): again and again, look through the crates still in
// the hold for the first one whose earlier crates have all gone.
#include <cstdio>
#include <vector>

int main() {
    int n, m;
    if (std::scanf("%d %d", &n, &m) != 2) return 1;
    std::vector<std::vector<int>> before(n + 1);
    for (int i = 0; i < m; ++i) {
        int a, b;
        if (std::scanf("%d %d", &a, &b) != 2) return 1;
        before[b].push_back(a);
    }
    std::vector<char> gone(n + 1, 0);
    std::vector<int> order;
    for (int round = 0; round < n; ++round) {
        int pick = 0;
        for (int c = 1; c <= n && !pick; ++c) {
            if (gone[c]) continue;
            bool free = true;
            for (int a : before[c])
                if (!gone[a]) {
                    free = false;
                    break;
                }
            if (free) pick = c;
        }
        if (!pick) break;
        gone[pick] = 1;
        order.push_back(pick);
    }
    if ((int)order.size() != n) {
        std::printf("STUCK\n");
        return 0;
    }
    for (int i = 0; i < n; ++i) std::printf("%d%c", order[i], i + 1 < n ? ' ' : '\n');
}
