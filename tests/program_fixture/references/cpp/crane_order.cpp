#include <algorithm>
#include <cstdio>
#include <numeric>
#include <vector>

int main() {
    int n;
    if (std::scanf("%d", &n) != 1) return 1;
    std::vector<long long> w(n);
    for (auto &x : w) std::scanf("%lld", &x);
    std::vector<int> order(n);
    std::iota(order.begin(), order.end(), 0);
    std::stable_sort(order.begin(), order.end(), [&](int a, int b) { return w[a] < w[b]; });
    for (int i = 0; i < n; ++i) std::printf(i ? " %d" : "%d", order[i] + 1);
    std::printf("\n");
}
