// Wrong on purpose: the right algorithm with a 32-bit counter. A long row in reverse order has
// about n*n/2 = 2e10 out-of-order pairs, which wraps around in an int.
#include <algorithm>
#include <cstdio>
#include <vector>

int main() {
    int n;
    if (std::scanf("%d", &n) != 1) return 1;
    std::vector<long long> w(n);
    for (auto& x : w)
        if (std::scanf("%lld", &x) != 1) return 1;
    std::vector<long long> sorted = w;
    std::sort(sorted.begin(), sorted.end());
    sorted.erase(std::unique(sorted.begin(), sorted.end()), sorted.end());
    int size = sorted.size();
    std::vector<int> tree(size + 1, 0);
    int swaps = 0;
    for (int seen = 0; seen < n; ++seen) {
        int r = std::lower_bound(sorted.begin(), sorted.end(), w[seen]) - sorted.begin() + 1;
        int not_heavier = 0;
        for (int i = r; i > 0; i &= i - 1) not_heavier += tree[i];
        swaps += seen - not_heavier;
        for (int i = r; i <= size; i += i & -i) ++tree[i];
    }
    std::printf("%d\n", swaps);
}
