#include <algorithm>
#include <cstdio>
#include <vector>

int main() {
    int n;
    if (std::scanf("%d", &n) != 1) return 1;
    std::vector<long long> t(n), h(n);
    for (int i = 0; i < n; ++i)
        if (std::scanf("%lld %lld", &t[i], &h[i]) != 2) return 1;
    int q;
    if (std::scanf("%d", &q) != 1) return 1;
    for (int k = 0; k < q; ++k) {
        long long x;
        if (std::scanf("%lld", &x) != 1) return 1;
        // t[i] <= x < t[i + 1], or x == t[n - 1]
        int i = std::upper_bound(t.begin(), t.end(), x) - t.begin() - 1;
        double height = i == n - 1 ? (double)h[i]
                                   : h[i] + (double)(h[i + 1] - h[i]) * (x - t[i]) / (double)(t[i + 1] - t[i]);
        std::printf("%.9f\n", height);
    }
}
