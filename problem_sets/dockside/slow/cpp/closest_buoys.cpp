// Slow on purpose (correct, quadratic): every pair of buoys.
#include <cmath>
#include <cstdint>
#include <cstdio>
#include <vector>

int main() {
    int n;
    if (std::scanf("%d", &n) != 1) return 1;
    std::vector<int64_t> x(n), y(n);
    for (int i = 0; i < n; ++i)
        if (std::scanf("%ld %ld", &x[i], &y[i]) != 2) return 1;
    int64_t best = INT64_MAX;
    for (int i = 0; i < n; ++i)
        for (int j = i + 1; j < n; ++j) {
            int64_t d = (x[i] - x[j]) * (x[i] - x[j]) + (y[i] - y[j]) * (y[i] - y[j]);
            if (d < best) best = d;
        }
    std::printf("%.9f\n", std::sqrt((double)best));
}
