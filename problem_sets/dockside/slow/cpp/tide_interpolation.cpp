// Slow on purpose (correct, O(n*q)): walk the table from the start for every question.
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
        int i = 0;
        while (i + 1 < n && t[i + 1] <= x) ++i;
        double height = i == n - 1 ? (double)h[i]
                                   : h[i] + (double)(h[i + 1] - h[i]) * (x - t[i]) / (double)(t[i + 1] - t[i]);
        std::printf("%.9f\n", height);
    }
}
