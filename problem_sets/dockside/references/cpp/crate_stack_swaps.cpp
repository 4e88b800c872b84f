#include <algorithm>
#include <cstdint>
#include <cstdio>
#include <vector>

int main() {
    int n;
    if (std::scanf("%d", &n) != 1) return 1;
    std::vector<int64_t> w(n);
    for (auto& x : w)
        if (std::scanf("%ld", &x) != 1) return 1;
    std::vector<int64_t> sorted = w;
    std::sort(sorted.begin(), sorted.end());
    sorted.erase(std::unique(sorted.begin(), sorted.end()), sorted.end());
    int size = sorted.size();
    std::vector<int> tree(size + 1, 0);  // Fenwick tree of counts by weight rank
    int64_t swaps = 0;
    for (int seen = 0; seen < n; ++seen) {
        int r = std::lower_bound(sorted.begin(), sorted.end(), w[seen]) - sorted.begin() + 1;
        int64_t not_heavier = 0;
        for (int i = r; i > 0; i &= i - 1) not_heavier += tree[i];
        swaps += seen - not_heavier;  // earlier crates heavier than this one
        for (int i = r; i <= size; i += i & -i) ++tree[i];
    }
    std::printf("%ld\n", swaps);
}
